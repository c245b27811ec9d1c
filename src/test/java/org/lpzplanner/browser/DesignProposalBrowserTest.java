package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * In a real browser: open the design page from the plan, propose air-termination, see it drawn and
 * counted against the regular layout, accept it, and find the rods on the site's plan.
 */
class DesignProposalBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    @Test
    void proposeAndAcceptWritesTheRodsIntoTheSite() throws Exception {
        StoredSite site = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Quay shed", "II", null);
        analyses.run(site.id(), null, null, null);

        browser.get("http://localhost:" + port + "/sites/" + site.id());
        browser.findElement(By.id("design-link")).click();
        new WebDriverWait(browser, Duration.ofSeconds(30)).until(b -> b.findElement(By.id("propose-form")).isDisplayed());
        assertThat(browser.findElement(By.cssSelector("section.cautions")).getText()).isNotBlank();

        browser.findElement(By.id("keep-out")).sendKeys("38 -1; 42 -1; 42 41; 38 41");
        browser.findElement(By.id("propose")).click();
        new WebDriverWait(browser, Duration.ofSeconds(120))
                .until(b -> b.findElement(By.id("proposal-result")).isDisplayed());
        String counts = browser.findElement(By.id("proposal-counts")).getText();
        assertThat(counts).contains("parts proposed").contains("regular layout");
        assertThat(browser.findElement(By.id("proposal-verdict")).getText()).startsWith("Complete");
        int drawn = browser.findElements(By.cssSelector("#proposal-layer circle.proposed")).size();
        assertThat(drawn).isPositive();
        assertThat(browser.findElements(By.cssSelector("#keep-out-layer polygon"))).hasSize(1);
        browser.executeScript("document.getElementById('design-drawing').scrollIntoView({block: 'start'});");
        Path shots = Path.of("target", "screenshots");
        Files.createDirectories(shots);
        Files.write(shots.resolve("design-proposal.png"), browser.getScreenshotAs(OutputType.BYTES));

        browser.findElement(By.id("accept-proposal")).click();
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(b -> b.findElement(By.id("accepted-actions")).isDisplayed());
        browser.findElement(By.id("open-plan")).click();
        new WebDriverWait(browser, Duration.ofSeconds(60))
                .until(b -> b.getCurrentUrl().endsWith("/sites/" + site.id()));
        assertThat(sites.document(sites.get(site.id())).site().rods()).hasSize(drawn);
    }
}

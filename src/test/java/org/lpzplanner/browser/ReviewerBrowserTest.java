package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.Role;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * A reviewer reads a site's plan without editing forms, comments, marks the revision reviewed and
 * finds both in the comments and the history. Screenshot: target/screenshots/reviewer-plan.png.
 */
@SignedIn(role = Role.REVIEWER)
class ReviewerBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    @Test
    void reviewerCommentsAndMarksTheRevisionReviewed() throws Exception {
        StoredSite site = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites", "harbour-warehouse.geojson")), "Quay shed", "II", null);
        analyses.run(site.id(), null, null, null);

        browser.get("http://localhost:" + port + "/sites/" + site.id());
        assertThat(browser.findElements(By.id("rename-form"))).isEmpty();
        assertThat(browser.findElements(By.id("correction-form"))).isEmpty();
        assertThat(browser.findElements(By.cssSelector(".accept-form"))).isEmpty();

        browser.findElement(By.cssSelector("#comment-form textarea")).sendKeys("Parapet height to be checked on site.");
        clickAndAwaitNewPage(By.cssSelector("#comment-form button"));
        // each form reloads the page: wait for the new page before the next step
        new WebDriverWait(browser, Duration.ofSeconds(20)).until(
                ExpectedConditions.presenceOfElementLocated(By.id("comment-list")));
        clickAndAwaitNewPage(By.cssSelector("#reviewed-form button"));
        new WebDriverWait(browser, Duration.ofSeconds(20)).until(
                ExpectedConditions.presenceOfElementLocated(By.id("reviewed-marks")));

        assertThat(browser.findElement(By.id("comment-list")).getText()).contains("Parapet height to be checked",
                "reviewer@default.test");
        assertThat(browser.findElement(By.id("reviewed-marks")).getText())
                .contains("Revision 1 reviewed by reviewer@default.test");
        assertThat(browser.findElement(By.id("history-list")).getText()).contains("marked reviewed", "comment",
                "analysed", "uploaded");
        browser.findElement(By.id("comments"));
        browser.executeScript("document.getElementById('comments').scrollIntoView()");
        Path shots = Files.createDirectories(Path.of("target", "screenshots"));
        Files.copy(browser.getScreenshotAs(OutputType.FILE).toPath(), shots.resolve("reviewer-plan.png"),
                StandardCopyOption.REPLACE_EXISTING);
    }
}

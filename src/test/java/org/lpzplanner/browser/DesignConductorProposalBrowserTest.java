package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.design.MetalInstallationService;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * In a real browser: propose with roof-edge and ridge conductors allowed, see the conductors drawn,
 * accept, and find rods and conductors in the site; then the design page's separation distances
 * show l with its route, beside the cautions.
 */
class DesignConductorProposalBrowserTest extends BrowserTestBase {

    /** A gable-roofed hall with a plant box beside it on a flat block (invented). */
    private static final String HALL = """
            {"type": "FeatureCollection", "name": "Test hall", "coordinates": "local-metres", "features": [
              {"type": "Feature", "properties": {"kind": "structure", "name": "Hall", "height": 6, "roof": "gable",
                "ridgeHeight": 9, "ridgeBearing": 90},
               "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [24, 0], [24, 10], [0, 10], [0, 0]]]}},
              {"type": "Feature", "properties": {"kind": "structure", "name": "Block", "height": 7, "roof": "flat",
                "parapet": 1},
               "geometry": {"type": "Polygon", "coordinates": [[[40, 0], [52, 0], [52, 12], [40, 12], [40, 0]]]}},
              {"type": "Feature", "properties": {"kind": "rooftop-object", "name": "Plant box", "top": 8.5},
               "geometry": {"type": "Polygon", "coordinates": [[[45, 5], [47, 5], [47, 7], [45, 7], [45, 5]]]}}
            ]}""";

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    @Autowired
    MetalInstallationService installations;

    @Test
    void proposeWithConductorsAcceptAndSeeTheSeparationRoutes() throws Exception {
        StoredSite site = sites.create("hall.geojson", HALL.getBytes(StandardCharsets.UTF_8), "Test hall", "II", null);
        analyses.run(site.id(), null, null, null);
        installations.add(site.id(), "Vent pipe", 41.0, 6.0, 8.5, "AIR");

        browser.get("http://localhost:" + port + "/sites/" + site.id() + "/design");
        new WebDriverWait(browser, Duration.ofSeconds(30)).until(b -> b.findElement(By.id("propose-form")).isDisplayed());
        WebElement heights = browser.findElement(By.id("rod-heights"));
        heights.clear();
        heights.sendKeys("0.3");
        browser.findElement(By.id("edge-conductors")).click();
        browser.findElement(By.id("ridge-conductors")).click();
        browser.findElement(By.id("propose")).click();
        new WebDriverWait(browser, Duration.ofSeconds(120))
                .until(b -> b.findElement(By.id("proposal-result")).isDisplayed());
        int lines = browser.findElements(By.cssSelector("#proposal-layer polyline.proposed")).size();
        int circles = browser.findElements(By.cssSelector("#proposal-layer circle.proposed")).size();
        assertThat(lines).as("proposed conductors drawn").isPositive();
        assertThat(browser.findElement(By.id("proposal-parts")).getText()).contains("conductor");
        browser.executeScript("document.getElementById('proposal-result').scrollIntoView({block: 'start'});");
        Path shots = Path.of("target", "screenshots");
        Files.createDirectories(shots);
        Files.write(shots.resolve("design-conductor-proposal.png"), browser.getScreenshotAs(OutputType.BYTES));

        browser.findElement(By.id("accept-proposal")).click();
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(b -> b.findElement(By.id("accepted-actions")).isDisplayed());
        assertThat(browser.findElement(By.id("accepted-summary")).getText())
                .contains(circles + " rods or masts and " + lines + " conductors");
        Files.write(shots.resolve("design-accepted.png"), browser.getScreenshotAs(OutputType.BYTES));
        browser.findElement(By.id("open-plan")).click();
        new WebDriverWait(browser, Duration.ofSeconds(60))
                .until(b -> b.getCurrentUrl().endsWith("/sites/" + site.id()));
        Site stored = sites.document(sites.get(site.id())).site();
        assertThat(stored.conductors()).hasSize(lines);
        assertThat(stored.rods()).hasSize(circles);

        browser.get("http://localhost:" + port + "/sites/" + site.id() + "/design#separation");
        new WebDriverWait(browser, Duration.ofSeconds(30)).until(b -> b.findElement(By.id("separation-table")).isDisplayed());
        String table = browser.findElement(By.id("separation-table")).getText();
        assertThat(table).contains("Plant box").contains("Vent pipe").contains("m down it");
        assertThat(browser.findElement(By.cssSelector("section.cautions")).getText()).isNotBlank();
        browser.executeScript("document.getElementById('separation').scrollIntoView({block: 'start'});");
        Files.write(shots.resolve("design-separation.png"), browser.getScreenshotAs(OutputType.BYTES));
        browser.executeScript("document.getElementById('quantities').scrollIntoView({block: 'start'});");
        Files.write(shots.resolve("design-quantities.png"), browser.getScreenshotAs(OutputType.BYTES));
    }
}

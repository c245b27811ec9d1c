package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.sites.SiteService;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * In a real browser: a hut under a wire strung at 45 m between two 45 m masts, at level I (R = 20 m,
 * IEC 62305-3:2010 Table 2). The wire runs more than R above what lies beneath it (IEC 62305-3:2010
 * Annex A): the warning box is shown above the plan, the stretch is drawn on the plan, and the
 * review row of the warning marks that stretch.
 */
class ModelWarningBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    @Test
    void theWarningIsShownAboveThePlanAndItsStretchIsDrawnAndMarkedFromTheReviewList() throws Exception {
        long id = sites.create("wire-above-hut.geojson",
                Files.readAllBytes(Path.of("src/test/resources/sites/wire-above-hut.geojson")), "Wire above a hut",
                "I", null).id();
        analyses.run(id, null, null, null);

        browser.get("http://localhost:" + port + "/sites/" + id);
        WebElement box = browser.findElement(By.id("model-warnings"));
        assertThat(box.isDisplayed()).isTrue();
        assertThat(box.getText()).contains("Span wire").contains("more than the sphere radius 20 m");
        // above the drawing, where it cannot be missed
        WebElement drawing = browser.findElement(By.id("plan-drawing"));
        assertThat(box.getLocation().getY()).isLessThan(drawing.getLocation().getY());
        assertThat(browser.findElement(By.id("plan-status")).getText()).contains("No verdict of full protection");

        WebElement stretch = browser.findElement(By.cssSelector("#plan-drawing svg path.model-warning"));
        assertThat(stretch.getSize().getWidth()).as("drawn along the 100 m wire").isGreaterThan(100);
        saveScreenshot("model-warning-plan");

        WebElement row = browser.findElement(By.cssSelector(
                "#review-list tbody tr[data-item-key='" + stretch.getAttribute("data-item-key") + "']"));
        row.findElement(By.tagName("td")).click();
        List<WebElement> marked = browser.findElements(By.cssSelector("#plan-drawing svg .highlighted"));
        assertThat(marked).hasSize(1);
        assertThat(marked.get(0).getAttribute("class")).contains("model-warning");
        assertThat(row.getText()).contains("not yet accepted");
        browser.executeScript("arguments[0].scrollIntoView({block: 'center'});", drawing);
        saveScreenshot("model-warning-stretch-marked");
    }

    private void saveScreenshot(String name) throws Exception {
        Path dir = Path.of("target", "screenshots");
        Files.createDirectories(dir);
        Files.write(dir.resolve(name + ".png"), browser.getScreenshotAs(OutputType.BYTES));
    }
}

package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.sites.SiteService;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * In a real browser: selecting a row of the review list, with the mouse or with Enter on the
 * focused row, marks the matching item on the plan and only that one.
 */
class ReviewListBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    private List<WebElement> highlighted() {
        return browser.findElements(By.cssSelector("#plan-drawing svg .highlighted"));
    }

    @Test
    void selectingAReviewRowHighlightsItsItemOnThePlan() throws Exception {
        long id = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Reviewed quay shed", "II",
                null).id();
        analyses.run(id, null, null, null);

        browser.get("http://localhost:" + port + "/sites/" + id);
        List<WebElement> rows = browser.findElements(By.cssSelector("#review-list tbody tr"));
        assertThat(rows).hasSizeGreaterThan(1);
        WebElement first = rows.get(0);
        String firstKey = first.getAttribute("data-item-key");

        first.findElement(By.tagName("td")).click();
        assertThat(highlighted()).hasSize(1);
        assertThat(highlighted().get(0).getAttribute("data-item-key")).isEqualTo(firstKey);
        assertThat(first.getAttribute("class")).contains("selected");
        saveScreenshot("review-row-highlighted");

        WebElement second = rows.get(1);
        second.sendKeys(Keys.ENTER);
        assertThat(highlighted()).hasSize(1);
        assertThat(highlighted().get(0).getAttribute("data-item-key")).isEqualTo(second.getAttribute("data-item-key"));
        assertThat(first.getAttribute("class")).doesNotContain("selected");

        second.sendKeys(Keys.ENTER);
        assertThat(highlighted()).isEmpty();
    }

    private void saveScreenshot(String name) throws Exception {
        Path dir = Path.of("target", "screenshots");
        Files.createDirectories(dir);
        Files.write(dir.resolve(name + ".png"), browser.getScreenshotAs(OutputType.BYTES));
    }
}

package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.lpzplanner.common.Cautions;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * In a real browser: upload a sample site from the site list, land on its plan, and find the drawing,
 * the exposure summary and every caution there. Saves a screenshot of the plan page as a test
 * artefact (target/screenshots/plan-page.png).
 */
class UploadAndPlanBrowserTest extends BrowserTestBase {

    @Test
    void uploadedSiteOpensOnItsPlanWithDrawingSummaryAndCautions() throws Exception {
        browser.get("http://localhost:" + port + "/");
        // the form's token goes in a hidden field of the body, never in the address
        assertThat(browser.findElement(By.id("upload-form")).getDomAttribute("action")).isEqualTo("/sites");
        assertThat(browser.findElements(By.cssSelector("#upload-form input[type=hidden][name=_csrf]"))).hasSize(1);
        WebElement file = browser.findElement(By.cssSelector("input[type=file][name=file]"));
        file.sendKeys(Path.of("sample-sites/harbour-warehouse.geojson").toAbsolutePath().toString());
        browser.findElement(By.name("name")).sendKeys("Browser check shed");
        browser.findElement(By.cssSelector("section.upload form button[type=submit]")).click();

        // the upload analyses the site before the plan opens: wait for it
        new WebDriverWait(browser, Duration.ofSeconds(30)).until(ExpectedConditions.urlMatches(".*/sites/\\d+$"));
        assertThat(browser.getCurrentUrl()).matches(".*/sites/\\d+$");
        WebElement svg = browser.findElement(By.cssSelector("svg.plan"));
        assertThat(svg.findElements(By.cssSelector("text.structure-label"))).anySatisfy(
                label -> assertThat(label.getText()).contains("Warehouse"));
        String page = browser.findElement(By.tagName("body")).getText();
        assertThat(page).contains("Browser check shed", "rolling sphere method", "Protection level II");
        for (String caution : Cautions.lines()) {
            assertThat(page.replaceAll("\\s+", " ")).contains(caution);
        }
        // the sample's bare warehouse roof is exposed, so the plan shows exposed roof areas
        assertThat(svg.findElements(By.cssSelector("path.exposed-roof"))).isNotEmpty();

        Path shots = Files.createDirectories(Path.of("target", "screenshots"));
        Path shot = browser.getScreenshotAs(OutputType.FILE).toPath();
        Files.copy(shot, shots.resolve("plan-page.png"), StandardCopyOption.REPLACE_EXISTING);
        assertThat(Files.size(shots.resolve("plan-page.png"))).isGreaterThan(10_000);
    }
}

package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.lpzplanner.common.Cautions;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * In a real browser: open the risk page of an uploaded site from its plan, choose the building's
 * factors, save, and set the lowest sufficient protection level with the button. The site is one
 * invented 40 m × 20 m × 10 m block; with T_d = 20, a hospital, high fire risk, automatic fire
 * provisions, difficulty of evacuation, no life-critical internal systems and no incoming lines,
 * R1 is 1.46 · 10⁻⁴ per year without an LPS and level II
 * is the lowest sufficient level (worked out in RiskApiTest from IEC 62305-2:2010's formulas).
 * On the plan page the analysis form then starts at level II with a note, and the collection area
 * is switched on and off as a layer. Saves target/screenshots/risk-page.png and plan-collection-area.png.
 */
class RiskPageBrowserTest extends BrowserTestBase {

    private static final String BLOCK = """
            {"type": "FeatureCollection", "name": "Risk block", "coordinates": "local-metres", "features": [
              {"type": "Feature", "properties": {"kind": "structure", "name": "Ward block", "height": 10},
               "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [40, 0], [40, 20], [0, 20], [0, 0]]]}},
              {"type": "Feature", "properties": {"kind": "structure", "name": "Boiler house", "height": 6},
               "geometry": {"type": "Polygon", "coordinates": [[[55, 0], [65, 0], [65, 8], [55, 8], [55, 0]]]}}
            ]}
            """;

    @Test
    void designerChoosesFactorsSavesAndSetsTheLowestSufficientLevel() throws Exception {
        Path file = Files.createDirectories(Path.of("target", "browser-files")).resolve("risk-block.geojson");
        Files.writeString(file, BLOCK);
        browser.get("http://localhost:" + port + "/");
        browser.findElement(By.cssSelector("input[type=file][name=file]")).sendKeys(file.toAbsolutePath().toString());
        new Select(browser.findElement(By.name("level"))).selectByValue("IV");
        browser.findElement(By.cssSelector("form button[type=submit]")).click();
        new WebDriverWait(browser, Duration.ofSeconds(30)).until(ExpectedConditions.urlMatches(".*/sites/\\d+$"));

        browser.findElement(By.id("risk-link")).click();
        new WebDriverWait(browser, Duration.ofSeconds(10)).until(ExpectedConditions.urlMatches(".*/sites/\\d+/risk$"));
        assertThat(browser.findElement(By.id("risk-defaults")).getText()).contains("No risk inputs are saved");
        WebElement svg = browser.findElement(By.cssSelector("svg.collection-area"));
        assertThat(svg.findElements(By.cssSelector("path.collection-zone"))).hasSize(1);
        assertThat(browser.findElement(By.id("location-suggestion")).getText()).contains("Ward block");

        WebElement days = browser.findElement(By.name("thunderstormDays"));
        days.clear();
        days.sendKeys("20");
        // no verdict before the inputs without a default are chosen
        assertThat(browser.findElements(By.id("risk-options"))).isEmpty();
        assertThat(browser.findElement(By.id("risk-missing")).getText()).contains("Location factor C_D", "Fire risk r_f");
        new Select(browser.findElement(By.name("location"))).selectByValue("SUGGESTED");
        new Select(browser.findElement(By.name("structureUse"))).selectByValue("HOSPITAL_HOTEL_SCHOOL_CIVIC");
        new Select(browser.findElement(By.name("fireRisk"))).selectByValue("HIGH");
        new Select(browser.findElement(By.name("fireProvisions"))).selectByValue("AUTOMATIC");
        new Select(browser.findElement(By.name("specialHazard"))).selectByValue("DIFFICULT_EVACUATION");
        new Select(browser.findElement(By.name("lifeCriticalSystems"))).selectByValue("NO");
        WebElement lines = browser.findElement(By.name("lineCount"));
        lines.clear();
        lines.sendKeys("0");
        browser.findElement(By.id("save-risk")).click();

        new WebDriverWait(browser, Duration.ofSeconds(10)).until(ExpectedConditions.presenceOfElementLocated(By.id("risk-saved")));
        assertThat(browser.findElement(By.id("risk-outcome")).getText()).contains("lowest protection level", "is II");
        assertThat(browser.findElement(By.id("risk-dominance")).getText()).contains("R_B");
        assertThat(browser.findElements(By.cssSelector("#risk-options tbody tr"))).hasSize(5);
        String page = browser.findElement(By.tagName("body")).getText().replaceAll("\\s+", " ");
        for (String caution : Cautions.lines()) {
            assertThat(page).contains(caution);
        }

        // the plan page: the analysis form starts at the estimate's level II (the site is at IV), says
        // why, and the collection area can be switched on as a layer of the plan
        String riskUrl = browser.getCurrentUrl();
        browser.findElement(By.linkText("Back to the plan of Risk block")).click();
        new WebDriverWait(browser, Duration.ofSeconds(10)).until(ExpectedConditions.urlMatches(".*/sites/\\d+$"));
        Select level = new Select(browser.findElement(By.cssSelector("#analysis-form select[name=level]")));
        assertThat(level.getFirstSelectedOption().getAttribute("value")).isEqualTo("II");
        assertThat(browser.findElement(By.id("analysis-level-note")).getText())
                .contains("starts at level II", "instead of the site's level IV");
        WebElement plan = browser.findElement(By.cssSelector("#plan-drawing svg.plan"));
        String plainViewBox = plan.getDomAttribute("viewBox");
        assertThat(plan.findElements(By.cssSelector("path.collection-area-layer"))).isEmpty();
        WebElement toggle = browser.findElement(By.id("collection-area-toggle"));
        assertThat(toggle.isDisplayed()).isTrue();
        toggle.click();
        WebElement layer = browser.findElement(By.cssSelector("#plan-drawing svg.plan path.collection-area-layer"));
        // the ward block's zone reaches 3·10 = 30 m beyond its walls (IEC 62305-2 Annex A): the zone
        // drawn on screen is wider than the block by 60 m at the plan's scale, and the view widened to hold it
        double scale = Double.parseDouble(plan.getDomAttribute("data-scale"));
        Number zoneWidth = (Number) browser.executeScript("return arguments[0].getBBox().width;", layer);
        assertThat(zoneWidth.doubleValue() / scale).isCloseTo(65 + 18 + 30, org.assertj.core.data.Offset.offset(0.5));
        assertThat(plan.getDomAttribute("viewBox")).isNotEqualTo(plainViewBox);
        Path shots = Files.createDirectories(Path.of("target", "screenshots"));
        browser.manage().window().setSize(new Dimension(1400, 1400));
        browser.executeScript("arguments[0].scrollIntoView();", plan);
        Files.copy(browser.getScreenshotAs(OutputType.FILE).toPath(), shots.resolve("plan-collection-area.png"),
                StandardCopyOption.REPLACE_EXISTING);
        toggle.click();
        assertThat(plan.findElements(By.cssSelector("path.collection-area-layer"))).isEmpty();
        assertThat(plan.getDomAttribute("viewBox")).isEqualTo(plainViewBox);
        browser.get(riskUrl);

        browser.findElement(By.id("select-level")).click();
        new WebDriverWait(browser, Duration.ofSeconds(10)).until(ExpectedConditions.presenceOfElementLocated(By.id("risk-level-set")));
        assertThat(browser.findElement(By.id("risk-level-set")).getText()).contains("Protection level II");
        assertThat(browser.findElement(By.id("level-already-set")).getText()).contains("II");

        // the whole page in one picture: the window as tall as the page
        Number height = (Number) browser.executeScript("return document.documentElement.scrollHeight;");
        browser.manage().window().setSize(new Dimension(1400, Math.min(8000, height.intValue() + 150)));
        Path shot = browser.getScreenshotAs(OutputType.FILE).toPath();
        Files.copy(shot, shots.resolve("risk-page.png"), StandardCopyOption.REPLACE_EXISTING);
        assertThat(Files.size(shots.resolve("risk-page.png"))).isGreaterThan(10_000);

        browser.findElement(By.linkText("Back to the plan of Risk block")).click();
        assertThat(browser.findElement(By.tagName("body")).getText()).contains("Risk block");
    }

    @Test
    void aZoneFarLargerThanThePlanIsClippedToTheDrawingWithANote() throws Exception {
        // a 10 × 10 m mast house 60 m tall: its zone reaches 3·60 = 180 m beyond the walls
        // (IEC 62305-2 Annex A), far beyond the drawn plan, which would shrink past reading if widened
        Path file = Files.createDirectories(Path.of("target", "browser-files")).resolve("risk-mast.geojson");
        Files.writeString(file, """
                {"type": "FeatureCollection", "name": "Risk mast", "coordinates": "local-metres", "features": [
                  {"type": "Feature", "properties": {"kind": "structure", "name": "Mast house", "height": 60},
                   "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [10, 0], [10, 10], [0, 10], [0, 0]]]}}
                ]}
                """);
        browser.get("http://localhost:" + port + "/");
        browser.findElement(By.cssSelector("input[type=file][name=file]")).sendKeys(file.toAbsolutePath().toString());
        browser.findElement(By.cssSelector("form button[type=submit]")).click();
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(ExpectedConditions.urlMatches(".*/sites/\\d+$"));

        WebElement plan = browser.findElement(By.cssSelector("#plan-drawing svg.plan"));
        String plainViewBox = plan.getDomAttribute("viewBox");
        assertThat(browser.findElement(By.id("collection-area-clipped")).isDisplayed()).isFalse();
        browser.findElement(By.id("collection-area-toggle")).click();

        WebElement layer = plan.findElement(By.cssSelector("path.collection-area-layer"));
        assertThat(layer.getDomAttribute("clip-path")).isEqualTo("url(#collection-area-clip)");
        assertThat(plan.getDomAttribute("viewBox")).isEqualTo(plainViewBox);
        assertThat(browser.findElement(By.id("collection-area-clipped")).getText()).contains("cut off", "risk page");
        Path shots = Files.createDirectories(Path.of("target", "screenshots"));
        browser.manage().window().setSize(new Dimension(1400, 1400));
        browser.executeScript("arguments[0].scrollIntoView();", plan);
        Files.copy(browser.getScreenshotAs(OutputType.FILE).toPath(), shots.resolve("plan-collection-area-clipped.png"),
                StandardCopyOption.REPLACE_EXISTING);

        browser.findElement(By.id("collection-area-toggle")).click();
        assertThat(plan.findElements(By.cssSelector(".collection-area-layer"))).isEmpty();
        assertThat(browser.findElement(By.id("collection-area-clipped")).isDisplayed()).isFalse();
    }
}

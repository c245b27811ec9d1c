package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * In a real browser: place a rod on a roof of the plan, see the summary change without a page
 * reload, drag the rod, undo the move, and find the work saved after reloading.
 */
class PlanEditingBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    private List<Rod> storedRods(long id) {
        return sites.document(sites.get(id)).site().rods();
    }

    @Test
    void placingDraggingAndUndoingARodUpdatesThePlanWithoutReloadAndIsSaved() throws Exception {
        StoredSite site = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Quay shed", "II", null);
        analyses.run(site.id(), null, null, null);

        browser.get("http://localhost:" + port + "/sites/" + site.id());
        waitUpTo(10).until(b -> b.findElement(By.id("plan-editor")).isDisplayed());
        browser.executeScript("window.pageMark = 'same page';");
        String before = exposedRoof();

        // place a 3 m rod in the middle of the roof (80 m x 40 m, free of rooftop objects at 40, 20)
        browser.findElement(By.id("place-rod")).click();
        long[] middle = viewportPoint(40, 20);
        new Actions(browser).moveToLocation((int) middle[0], (int) middle[1]).click().perform();
        WebElement form = browser.findElement(By.id("new-rod-form"));
        waitUpTo(5).until(b -> form.isDisplayed());
        assertThat(Double.parseDouble(form.findElement(By.name("x")).getAttribute("value"))).isCloseTo(40, within(0.5));
        assertThat(Double.parseDouble(form.findElement(By.name("y")).getAttribute("value"))).isCloseTo(20, within(0.5));
        new Select(form.findElement(By.name("heightChoice"))).selectByValue("3");
        browser.findElement(By.id("confirm-rod")).click();

        waitUpTo(20).until(b -> !exposedRoof().equals(before));
        assertThat(Double.parseDouble(exposedRoof())).isLessThan(Double.parseDouble(before));
        assertThat(browser.executeScript("return window.pageMark;")).isEqualTo("same page");
        // The revision shown is now the second one, and so is the one its print link asks for.
        assertThat(browser.findElement(By.id("print-revision")).getAttribute("href"))
                .endsWith("/api/sites/" + site.id() + "/revisions/2/report");
        assertThat(storedRods(site.id())).singleElement().satisfies(rod -> {
            assertThat(rod.height()).isEqualTo(3.0);
            assertThat(rod.x()).isCloseTo(40, within(0.5));
        });
        Rod placed = storedRods(site.id()).get(0);

        // drag the rod about 10 m east
        WebElement circle = waitUpTo(10).until(b -> b.findElement(By.cssSelector("circle.rod[data-rod-id='rod-1']")));
        double scale = Double.parseDouble(browser.findElement(By.cssSelector("#plan-drawing svg")).getAttribute("data-scale"));
        new Actions(browser).clickAndHold(circle).moveByOffset((int) Math.round(5 * scale), 0)
                .moveByOffset((int) Math.round(5 * scale), 0).release().perform();
        waitUpTo(20).until(b -> storedRods(site.id()).get(0).x() > placed.x() + 5);
        waitUpTo(10).until(b -> b.findElement(By.id("undo-change")).isEnabled());
        assertThat(storedRods(site.id()).get(0).x()).isCloseTo(placed.x() + 10, within(0.5));
        waitUpTo(10).until(b -> Math.abs(Double.parseDouble(
                b.findElement(By.cssSelector("#rod-form input[name=x]")).getAttribute("value")) - placed.x() - 10) < 0.5);
        saveScreenshot();

        // undo puts it back where it was placed
        browser.findElement(By.id("undo-change")).click();
        waitUpTo(20).until(b -> Math.abs(storedRods(site.id()).get(0).x() - placed.x()) < 0.001);
        assertThat(storedRods(site.id()).get(0).y()).isCloseTo(placed.y(), within(0.001));
        waitUpTo(10).until(b -> b.findElement(By.id("redo-change")).isEnabled());
        assertThat(browser.executeScript("return window.pageMark;")).isEqualTo("same page");

        // the work is in the stored file: a reload shows the rod at its placed position
        browser.navigate().refresh();
        waitUpTo(10).until(b -> b.findElement(By.id("plan-editor")).isDisplayed());
        assertThat(browser.findElements(By.cssSelector("circle.rod[data-rod-id='rod-1']"))).hasSize(1);
        new Select(browser.findElement(By.cssSelector("#rod-form select[name=rod]"))).selectByValue("rod-1");
        assertThat(Double.parseDouble(browser.findElement(By.cssSelector("#rod-form input[name=x]"))
                .getAttribute("value"))).isCloseTo(placed.x(), within(0.001));
        assertThat(browser.findElement(By.cssSelector("#rod-form input[name=height]")).getAttribute("value"))
                .isEqualTo("3");
        assertThat(exposedRoof()).isNotEqualTo(before);
        assertThat(sites.fileVersions(site.id())).hasSize(3);

        // arrow keys on the focused rod: 2 m east with Shift and 0.3 m north, sent as one change
        WebElement rod = browser.findElement(By.cssSelector("circle.rod[data-rod-id='rod-1']"));
        browser.executeScript("arguments[0].focus();", rod);
        new Actions(browser).keyDown(Keys.SHIFT).sendKeys(Keys.ARROW_RIGHT, Keys.ARROW_RIGHT).keyUp(Keys.SHIFT)
                .sendKeys(Keys.ARROW_UP, Keys.ARROW_UP, Keys.ARROW_UP).perform();
        waitUpTo(20).until(b -> Math.abs(storedRods(site.id()).get(0).x() - placed.x() - 2) < 0.001);
        assertThat(storedRods(site.id()).get(0).y()).isCloseTo(placed.y() + 0.3, within(0.001));
        assertThat(sites.fileVersions(site.id())).hasSize(4);

        // one tool at a time: drawing a section cut ends placing a rod
        browser.findElement(By.id("place-rod")).click();
        assertThat(browser.findElement(By.id("place-rod")).getAttribute("aria-pressed")).isEqualTo("true");
        browser.findElement(By.id("draw-cut")).click();
        assertThat(browser.findElement(By.id("draw-cut")).getAttribute("aria-pressed")).isEqualTo("true");
        assertThat(browser.findElement(By.id("place-rod")).getAttribute("aria-pressed")).isEqualTo("false");
        assertThat(browser.findElement(By.id("new-rod-form")).isDisplayed()).isFalse();
    }

    @Test
    void aRodClickedBesideTheParapetIsPlacedOnItsLineAndStandsOnItsTop() throws Exception {
        // the warehouse's walls are 10 m with a 1 m parapet along its outline (x 0–80, y 0–40)
        StoredSite site = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Quay shed", "II", null);
        analyses.run(site.id(), null, null, null);
        browser.get("http://localhost:" + port + "/sites/" + site.id());
        waitUpTo(10).until(b -> b.findElement(By.id("plan-editor")).isDisplayed());

        browser.findElement(By.id("place-rod")).click();
        long[] beside = viewportPoint(40, 39.85);
        new Actions(browser).moveToLocation((int) beside[0], (int) beside[1]).click().perform();
        WebElement form = browser.findElement(By.id("new-rod-form"));
        waitUpTo(5).until(b -> form.isDisplayed());
        assertThat(Double.parseDouble(form.findElement(By.name("y")).getAttribute("value"))).isEqualTo(40.0);
        assertThat(browser.findElement(By.id("editor-status")).getText()).contains("parapet of Warehouse");
        new Select(form.findElement(By.name("heightChoice"))).selectByValue("2");
        browser.findElement(By.id("confirm-rod")).click();

        waitUpTo(20).until(b -> !storedRods(site.id()).isEmpty());
        Rod rod = storedRods(site.id()).get(0);
        assertThat(rod.y()).isCloseTo(40, within(0.001));
        // on the parapet's top: 10 m wall + 1 m parapet + 2 m rod (the site's own geometry)
        assertThat(org.lpzplanner.engine.geom.SiteSurfaceBuilder.build(sites.document(sites.get(site.id())).site())
                .rods().get(0).tip().getZ()).isCloseTo(13, within(1e-9));
    }

    private void saveScreenshot() throws Exception {
        Path target = Path.of("target", "screenshots");
        Files.createDirectories(target);
        Files.write(target.resolve("plan-editing.png"), browser.getScreenshotAs(OutputType.BYTES));
    }
}

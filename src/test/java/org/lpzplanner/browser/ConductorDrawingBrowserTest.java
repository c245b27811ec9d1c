package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * In a real browser: draw a roof conductor with clicks on the plan, see the exposure change without
 * a reload, undo and redo it, delete it; and draw a catenary wire at a given elevation.
 */
class ConductorDrawingBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    private List<Conductor> stored(long id) {
        return sites.document(sites.get(id)).site().conductors();
    }

    private void clickAt(double x, double y) {
        long[] p = viewportPoint(x, y);
        new Actions(browser).moveToLocation((int) p[0], (int) p[1]).click().perform();
    }

    @Test
    void drawingUndoingAndDeletingConductorsUpdatesThePlanWithoutReload() throws Exception {
        StoredSite site = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Wired shed", "II", null);
        analyses.run(site.id(), null, null, null);
        browser.get("http://localhost:" + port + "/sites/" + site.id());
        waitUpTo(10).until(b -> b.findElement(By.id("plan-editor")).isDisplayed());
        browser.executeScript("window.pageMark = 'same page';");
        String before = exposedRoof();

        // a roof conductor 0.5 m above the roof along its middle
        browser.findElement(By.id("draw-conductor")).click();
        clickAt(20, 20);
        clickAt(60, 20);
        assertThat(browser.findElement(By.cssSelector("#new-conductor-form output[name=count]")).getText()).isEqualTo("2");
        var height = browser.findElement(By.cssSelector("#new-conductor-form input[name=height]"));
        height.clear();
        height.sendKeys("0.5");
        browser.findElement(By.id("confirm-conductor")).click();
        waitUpTo(30).until(b -> stored(site.id()).size() == 1 && !exposedRoof().equals(before));
        Conductor c = stored(site.id()).get(0);
        assertThat(c.heightAboveRoof()).isEqualTo(0.5);
        assertThat(c.path().get(0).x).isCloseTo(20, within(0.5));
        assertThat(c.path().get(1).x).isCloseTo(60, within(0.5));
        assertThat(Double.parseDouble(exposedRoof())).isLessThan(Double.parseDouble(before));
        Files.write(Files.createDirectories(Path.of("target", "screenshots")).resolve("conductor-drawn.png"),
                browser.getScreenshotAs(OutputType.BYTES));

        // undo removes it, redo brings it back
        waitUpTo(10).until(b -> b.findElement(By.id("undo-change")).isEnabled());
        browser.findElement(By.id("undo-change")).click();
        waitUpTo(30).until(b -> stored(site.id()).isEmpty() && exposedRoof().equals(before));
        waitUpTo(10).until(b -> b.findElement(By.id("redo-change")).isEnabled());
        browser.findElement(By.id("redo-change")).click();
        waitUpTo(30).until(b -> stored(site.id()).size() == 1);

        // a catenary wire at 16 m above ground, then the roof conductor deleted from the list
        browser.findElement(By.id("draw-conductor")).click();
        clickAt(-5, 10);
        clickAt(85, 10);
        new Select(browser.findElement(By.cssSelector("#new-conductor-form select[name=mounting]"))).selectByValue("wire");
        height = browser.findElement(By.cssSelector("#new-conductor-form input[name=height]"));
        height.clear();
        height.sendKeys("16");
        browser.findElement(By.id("confirm-conductor")).click();
        waitUpTo(30).until(b -> stored(site.id()).size() == 2);
        Conductor wire = stored(site.id()).get(1);
        assertThat(wire.followsSurface()).isFalse();
        assertThat(wire.path().get(0).getZ()).isEqualTo(16.0);

        waitUpTo(10).until(b -> b.findElements(By.cssSelector("#conductor-form select[name=conductor] option")).size() == 3);
        new Select(browser.findElement(By.cssSelector("#conductor-form select[name=conductor]"))).selectByValue(c.id());
        browser.findElement(By.id("delete-conductor")).click();
        waitUpTo(30).until(b -> stored(site.id()).size() == 1);
        assertThat(stored(site.id()).get(0).id()).isEqualTo(wire.id());
        assertThat(browser.executeScript("return window.pageMark;")).isEqualTo("same page");
    }
}

package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.airtermination.ConductorEdits;
import org.lpzplanner.airtermination.ConductorInput;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.engine.model.Conductor;
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
 * In a real browser: select a roof conductor on the plan, drag one of its points, see the exposure
 * change without a reload, undo it; nudge a point with the arrow keys, type exact values in the
 * side form, and drag the whole conductor.
 */
class ConductorEditingBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    @Autowired
    ConductorEdits conductors;

    private List<Coordinate> path(long id) {
        return sites.document(sites.get(id)).site().conductors().get(0).path();
    }

    /** Drags from one plan point to another (local metres), in small steps as a hand would. */
    private void drag(double fromX, double fromY, double toX, double toY) {
        browser.executeScript("document.querySelector('#plan-drawing svg').scrollIntoView({block: 'center'});");
        double[] a = screenPoint(fromX, fromY);
        double[] b = screenPoint(toX, toY);
        Actions actions = new Actions(browser).moveToLocation((int) Math.round(a[0]), (int) Math.round(a[1]))
                .clickAndHold();
        for (int step = 1; step <= 5; step++) {
            actions.moveToLocation((int) Math.round(a[0] + (b[0] - a[0]) * step / 5),
                    (int) Math.round(a[1] + (b[1] - a[1]) * step / 5));
        }
        actions.release().perform();
    }

    /** Waits until the page has applied the server's last answer. */
    private void settled() {
        waitUpTo(30).until(b -> b.findElement(By.id("plan-editor")).getAttribute("aria-busy") == null);
    }

    private WebElement vertex(int index) {
        return browser.findElement(By.cssSelector("#plan-drawing circle.conductor-vertex[data-vertex='" + index + "']"));
    }

    @Test
    void draggingAConductorPointChangesTheExposureAndUndoPutsItBack() throws Exception {
        StoredSite site = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Reshaped shed", "II", null);
        conductors.add(site.id(), sites.get(site.id()).version(), new ConductorInput(null,
                "Middle line", List.of(new double[] {20, 20}, new double[] {60, 20}), "1"));
        browser.get("http://localhost:" + port + "/sites/" + site.id());
        waitUpTo(10).until(b -> b.findElement(By.id("plan-editor")).isDisplayed());
        browser.executeScript("window.pageMark = 'same page';");
        browser.executeScript("document.querySelector('#plan-drawing svg').scrollIntoView({block: 'center'});");
        String before = exposedRoof();

        // select the conductor with a click on it, then drag its east end 40 m south, off the roof
        double[] middle = screenPoint(40, 20);
        new Actions(browser).moveToLocation((int) Math.round(middle[0]), (int) Math.round(middle[1])).click().perform();
        waitUpTo(10).until(b -> b.findElements(By.cssSelector("#plan-drawing circle.conductor-vertex")).size() == 2);
        assertThat(new Select(browser.findElement(By.cssSelector("#conductor-form select[name=conductor]")))
                .getFirstSelectedOption().getAttribute("value")).isEqualTo("conductor-1");
        drag(60, 20, 60, -20);
        waitUpTo(30).until(b -> path(site.id()).get(1).y < 0 && !exposedRoof().equals(before));
        assertThat(path(site.id()).get(1).y).isCloseTo(-20, within(1.0)); // a pixel is about 0.4 m here
        assertThat(path(site.id()).get(0).y).isEqualTo(20.0); // the other point stays
        // the conductor now crosses the roof on a slant, 1 m above it for about 44.7 m, climbs over
        // the parapet at y = 0 and runs on 1 m above the ground: it shelters another strip of the
        // roof, so the exposed area changes
        assertThat(Double.parseDouble(exposedRoof())).isNotEqualTo(Double.parseDouble(before));
        Files.write(Files.createDirectories(Path.of("target", "screenshots")).resolve("conductor-point-dragged.png"),
                browser.getScreenshotAs(OutputType.BYTES));

        // undo puts the point back and the exposure with it
        waitUpTo(10).until(b -> b.findElement(By.id("undo-change")).isEnabled());
        browser.findElement(By.id("undo-change")).click();
        waitUpTo(30).until(b -> path(site.id()).get(1).y == 20.0 && exposedRoof().equals(before));

        // arrow keys move the focused point: three steps of 1 m north with Shift
        waitUpTo(10).until(b -> b.findElements(By.cssSelector("#plan-drawing circle.conductor-vertex")).size() == 2);
        vertex(0).click();
        new Actions(browser).keyDown(Keys.SHIFT).sendKeys(Keys.ARROW_UP, Keys.ARROW_UP, Keys.ARROW_UP)
                .keyUp(Keys.SHIFT).perform();
        waitUpTo(30).until(b -> path(site.id()).get(0).y == 23.0);
        assertThat(path(site.id()).get(0).x).isEqualTo(20.0);
        settled();

        // exact values in the side form: the second point to x 70, and the height above the roof
        waitUpTo(10).until(b -> b.findElement(By.id("save-conductor")).isEnabled());
        new Select(browser.findElement(By.cssSelector("#conductor-form select[name=vertex]"))).selectByValue("1");
        WebElement x = browser.findElement(By.cssSelector("#conductor-form input[name=x]"));
        x.clear();
        x.sendKeys("70");
        WebElement height = browser.findElement(By.cssSelector("#conductor-form input[name=height]"));
        height.clear();
        height.sendKeys("0.5");
        browser.findElement(By.id("save-conductor")).click();
        waitUpTo(30).until(b -> path(site.id()).get(1).x == 70.0);
        settled();
        Conductor typed = sites.document(sites.get(site.id())).site().conductors().get(0);
        assertThat(typed.heightAboveRoof()).isEqualTo(0.5);
        assertThat(typed.path().get(1).y).isEqualTo(20.0);

        // the whole conductor dragged 10 m west: both points move by the same offset
        waitUpTo(10).until(b -> b.findElements(By.cssSelector("#plan-drawing polyline.conductor-outline")).size() == 1);
        drag(45, 21.5, 35, 21.5);
        waitUpTo(30).until(b -> path(site.id()).get(1).x < 65);
        assertThat(path(site.id()).get(0).x).isCloseTo(10, within(1.0));
        assertThat(path(site.id()).get(1).x).isCloseTo(60, within(1.0));
        assertThat(path(site.id()).get(1).x - path(site.id()).get(0).x).isCloseTo(50, within(0.02));
        assertThat(browser.executeScript("return window.pageMark;")).isEqualTo("same page");
        settled();
        Files.write(Path.of("target", "screenshots", "conductor-moved.png"), browser.getScreenshotAs(OutputType.BYTES));
    }
}

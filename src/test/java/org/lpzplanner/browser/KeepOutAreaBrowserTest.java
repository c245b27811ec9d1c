package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.keepout.KeepOutArea;
import org.lpzplanner.keepout.KeepOutAreaService;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.interactions.Actions;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * In a real browser: click a keep-out area's corners on the design page's plan, store it under a
 * name, see it listed and hatched there and on the site's plan with its legend row, and remove it.
 */
class KeepOutAreaBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;
    @Autowired
    AnalysisService analyses;
    @Autowired
    KeepOutAreaService keepOut;

    /** Viewport position (whole CSS pixels) of a point in local metres on the design page's plan. */
    private long[] designPoint(double x, double y) {
        browser.executeScript("document.querySelector('#design-drawing svg').scrollIntoView({block: 'center'});");
        @SuppressWarnings("unchecked")
        List<Number> p = (List<Number>) browser.executeScript(
                "const svg = document.querySelector('#design-drawing svg'); const d = svg.dataset;"
                        + "const p = svg.createSVGPoint();"
                        + "p.x = Number(d.margin) + (arguments[0] - Number(d.originX)) * Number(d.scale);"
                        + "p.y = Number(d.margin) + (Number(d.originY) - arguments[1]) * Number(d.scale);"
                        + "const s = p.matrixTransform(svg.getScreenCTM()); return [s.x, s.y];", x, y);
        return new long[] {Math.round(p.get(0).doubleValue()), Math.round(p.get(1).doubleValue())};
    }

    @Test
    void drawStoreShowOnBothPlansAndRemoveAKeepOutArea() throws Exception {
        StoredSite site = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Quay shed", "II", null);
        analyses.run(site.id(), null, null, null);
        Path shots = Path.of("target", "screenshots");
        Files.createDirectories(shots);

        browser.get("http://localhost:" + port + "/sites/" + site.id() + "/design");
        assertThat(browser.findElement(By.id("keep-out-areas")).getText())
                .contains("No keep-out areas are stored for this site.");
        // a 15 m × 10 m walkway on the warehouse roof (80 m × 40 m)
        for (double[] corner : new double[][] {{45, 15}, {60, 15}, {60, 25}, {45, 25}}) {
            long[] p = designPoint(corner[0], corner[1]);
            new Actions(browser).moveToLocation((int) p[0], (int) p[1]).click().perform();
        }
        assertThat(browser.findElement(By.id("keep-out")).getDomProperty("value").split(";")).hasSize(4);
        browser.findElement(By.id("keep-out-name")).sendKeys("Roof walkway");
        browser.findElement(By.id("store-keep-out")).click();
        waitUpTo(30).until(b -> !b.findElements(By.cssSelector("#keep-out-table tbody tr")).isEmpty());

        List<KeepOutArea> stored = keepOut.areas(site.id());
        assertThat(stored).singleElement().satisfies(a -> {
            assertThat(a.name()).isEqualTo("Roof walkway");
            assertThat(a.corners()).hasSize(4);
            // 15 m × 10 m = 150 m²; each corner is a click rounded to a whole pixel (about 0.1 m here)
            assertThat(a.area()).isCloseTo(150, within(150 * 0.05));
        });
        String row = browser.findElement(By.cssSelector("#keep-out-table tbody tr")).getText();
        assertThat(row).contains("Roof walkway").contains(String.format(java.util.Locale.ROOT, "%.2f",
                stored.get(0).area()));
        assertThat(browser.findElement(By.id("keep-out")).getDomProperty("value")).isBlank();
        assertThat(browser.findElements(By.cssSelector("#design-drawing path.keep-out-area"))).hasSize(1);
        browser.executeScript("document.getElementById('keep-out-areas').scrollIntoView({block: 'start'});");
        Files.write(shots.resolve("keep-out-design.png"), browser.getScreenshotAs(OutputType.BYTES));

        browser.get("http://localhost:" + port + "/sites/" + site.id());
        assertThat(browser.findElements(By.cssSelector("#plan-drawing path.keep-out-area[data-keep-out-name='Roof"
                + " walkway']"))).hasSize(1);
        assertThat(browser.findElement(By.cssSelector("#plan-drawing .legend")).getText())
                .contains("Keep-out area stored for the site");
        browser.executeScript("document.querySelector('#plan-drawing svg').scrollIntoView({block: 'start'});");
        Files.write(shots.resolve("keep-out-plan.png"), browser.getScreenshotAs(OutputType.BYTES));

        browser.get("http://localhost:" + port + "/sites/" + site.id() + "/design");
        browser.findElement(By.cssSelector("#keep-out-table .remove-keep-out")).click();
        waitUpTo(30).until(b -> b.findElements(By.id("keep-out-table")).isEmpty());
        assertThat(keepOut.areas(site.id())).isEmpty();
        assertThat(browser.findElements(By.cssSelector("#design-drawing path.keep-out-area"))).isEmpty();
    }
}

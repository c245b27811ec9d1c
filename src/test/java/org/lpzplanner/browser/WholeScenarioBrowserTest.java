package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.sites.SiteService;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * In a real browser, a designer's whole round: upload a sample site, find its exposed edges in the
 * review list, place a rod and drag it (the exposure changes without a reload), undo the drag, draw
 * a section cut with two clicks on the plan and open the section, then reload the plan and find the
 * work saved. Saves a screenshot of the plan page (target/screenshots/whole-scenario-plan.png).
 */
class WholeScenarioBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;

    private List<Rod> storedRods(long id) {
        return sites.document(sites.get(id)).site().rods();
    }

    private void clickAt(double x, double y) {
        long[] p = viewportPoint(x, y);
        new Actions(browser).moveToLocation((int) p[0], (int) p[1]).click().perform();
    }

    @Test
    void uploadReviewPlaceDragUndoSectionAndReload() throws Exception {
        // upload from the site list
        browser.get("http://localhost:" + port + "/");
        browser.findElement(By.cssSelector("input[type=file][name=file]"))
                .sendKeys(Path.of("sample-sites/harbour-warehouse.geojson").toAbsolutePath().toString());
        browser.findElement(By.name("name")).sendKeys("Whole round shed");
        browser.findElement(By.cssSelector("form button[type=submit]")).click();
        waitUpTo(60).until(ExpectedConditions.urlMatches(".*/sites/\\d+$"));
        String planUrl = browser.getCurrentUrl();
        long id = Long.parseLong(planUrl.substring(planUrl.lastIndexOf('/') + 1));
        waitUpTo(10).until(b -> b.findElement(By.id("plan-editor")).isDisplayed());

        // the bare warehouse roof has exposed edges, listed for review
        List<WebElement> rows = browser.findElements(By.cssSelector("#review-list tbody tr[data-item-key]"));
        assertThat(rows).isNotEmpty();
        assertThat(rows).anySatisfy(r -> assertThat(r.getText().toLowerCase()).contains("edge"));
        String before = exposedRoof();

        // place a 3 m rod in the middle of the 80 m x 40 m roof
        browser.findElement(By.id("place-rod")).click();
        clickAt(40, 20);
        WebElement form = browser.findElement(By.id("new-rod-form"));
        waitUpTo(5).until(b -> form.isDisplayed());
        new Select(form.findElement(By.name("heightChoice"))).selectByValue("3");
        browser.findElement(By.id("confirm-rod")).click();
        waitUpTo(30).until(b -> !exposedRoof().equals(before));
        String withRod = exposedRoof();
        assertThat(Double.parseDouble(withRod)).isLessThan(Double.parseDouble(before));
        Rod placed = storedRods(id).get(0);

        // drag it 20 m east: the exposed area changes again, without a reload
        browser.executeScript("window.pageMark = 'same page';");
        WebElement circle = waitUpTo(10).until(b -> b.findElement(By.cssSelector("circle.rod[data-rod-id='rod-1']")));
        double scale = Double.parseDouble(browser.findElement(By.cssSelector("#plan-drawing svg")).getAttribute("data-scale"));
        new Actions(browser).clickAndHold(circle).moveByOffset((int) Math.round(10 * scale), 0)
                .moveByOffset((int) Math.round(10 * scale), 0).release().perform();
        waitUpTo(30).until(b -> storedRods(id).get(0).x() > placed.x() + 15);
        waitUpTo(30).until(b -> !exposedRoof().equals(withRod));
        assertThat(browser.executeScript("return window.pageMark;")).isEqualTo("same page");

        // undo the drag
        waitUpTo(10).until(b -> b.findElement(By.id("undo-change")).isEnabled());
        browser.findElement(By.id("undo-change")).click();
        waitUpTo(30).until(b -> Math.abs(storedRods(id).get(0).x() - placed.x()) < 0.001);
        waitUpTo(30).until(b -> exposedRoof().equals(withRod));

        // draw a cut along the roof's long axis with two clicks and open the section
        WebElement cutForm = browser.findElement(By.id("section-form"));
        browser.findElement(By.id("draw-cut")).click();
        clickAt(-10, 20);
        clickAt(90, 20);
        assertThat(Double.parseDouble(cutForm.findElement(By.name("x1")).getAttribute("value"))).isCloseTo(-10, within(0.5));
        assertThat(Double.parseDouble(cutForm.findElement(By.name("y2")).getAttribute("value"))).isCloseTo(20, within(0.5));
        assertThat(browser.findElements(By.cssSelector("#plan-drawing line.cut-line"))).hasSize(1);
        assertThat(storedRods(id)).as("clicks for the cut place no rod").hasSize(1);
        browser.executeScript("document.querySelector('#plan-drawing').scrollIntoView({block: 'start'});");
        saveScreenshot("whole-scenario-plan.png");
        cutForm.findElement(By.cssSelector("button[type=submit]")).click();
        waitUpTo(30).until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("svg.section")));
        String section = browser.findElement(By.tagName("body")).getText().replaceAll("\\s+", " ");
        for (String caution : Cautions.lines()) {
            assertThat(section).contains(caution);
        }
        assertThat(browser.findElements(By.cssSelector("svg.section .section-rod"))).isNotEmpty();

        // back on the plan after a reload, the rod is where it was placed
        browser.get(planUrl);
        waitUpTo(10).until(b -> b.findElement(By.id("plan-editor")).isDisplayed());
        assertThat(browser.findElements(By.cssSelector("circle.rod[data-rod-id='rod-1']"))).hasSize(1);
        assertThat(storedRods(id)).singleElement().satisfies(rod -> assertThat(rod.x()).isCloseTo(placed.x(), within(0.001)));
        assertThat(exposedRoof()).isEqualTo(withRod);
    }

    private void saveScreenshot(String name) throws Exception {
        Path target = Files.createDirectories(Path.of("target", "screenshots"));
        Files.write(target.resolve(name), browser.getScreenshotAs(OutputType.BYTES));
    }
}

package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.lpzplanner.heavywork.HeavyWorkCapacity;
import org.lpzplanner.heavywork.HeldPlace;
import org.lpzplanner.editing.EditPipeline;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.sites.SiteService;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.test.context.TestPropertySource;

/**
 * In a real browser, while every analysis place is taken: a rod placed on the plan is saved, the
 * editor says the analysis is pending and why, keeps the site's new version and the undo step, so
 * undoing it is saved as well (not refused as stale); once a place is free, redoing it is analysed
 * and the plan shows the new analysis.
 */
@TestPropertySource(properties = {"lpz.analysis.concurrent=1", "lpz.analysis.wait-seconds=0"})
class PendingAnalysisBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;
    @Autowired
    EditPipeline edits;
    @Autowired
    HeavyWorkCapacity capacity;

    private HeldPlace held;

    private void takeTheOnlyAnalysisPlace() throws InterruptedException {
        held = HeldPlace.take(capacity);
    }

    @AfterEach
    void freeThePlace() throws InterruptedException {
        if (held != null) {
            held.close();
            held = null;
        }
    }

    private List<Rod> storedRods(long id) {
        return sites.document(sites.get(id)).site().rods();
    }

    private String editorStatus() {
        return browser.findElement(By.id("editor-status")).getText();
    }

    @Test
    void aRodPlacedWhileTheAnalysesAreBusyIsSavedAndItsUndoAndRedoFollowWithoutAConflict() throws Exception {
        long id = edits.upload("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Busy shed", "II", null).siteId();
        browser.get("http://localhost:" + port + "/sites/" + id);
        waitUpTo(10).until(b -> b.findElement(By.id("plan-editor")).isDisplayed());
        String before = exposedRoof();
        takeTheOnlyAnalysisPlace();

        // place a 3 m rod in the middle of the roof by typing its position
        browser.findElement(By.id("place-rod")).click();
        WebElement form = browser.findElement(By.id("new-rod-form"));
        waitUpTo(5).until(b -> form.isDisplayed());
        form.findElement(By.name("x")).sendKeys("40");
        form.findElement(By.name("y")).sendKeys("20");
        browser.findElement(By.id("confirm-rod")).click();

        waitUpTo(20).until(b -> editorStatus().contains("analysis pending"));
        assertThat(editorStatus()).startsWith("Saved; analysis pending: the server is busy");
        assertThat(browser.findElement(By.id("editor-status")).getAttribute("class")).doesNotContain("error");
        assertThat(storedRods(id)).hasSize(1);
        assertThat(browser.findElement(By.id("plan-status")).getText()).startsWith("No verdict");
        assertThat(exposedRoof()).isEqualTo(before);
        waitUpTo(10).until(b -> b.findElement(By.id("undo-change")).isEnabled());
        saveScreenshot();

        // the undo step was kept and is sent with the new version: saved, not refused as stale
        browser.findElement(By.id("undo-change")).click();
        waitUpTo(20).until(b -> storedRods(id).isEmpty());
        waitUpTo(10).until(b -> b.findElement(By.id("redo-change")).isEnabled());
        assertThat(editorStatus()).contains("analysis pending").doesNotContain("changed elsewhere");

        // with a place free again, redoing it is analysed and the plan shows the result
        freeThePlace();
        browser.findElement(By.id("redo-change")).click();
        waitUpTo(30).until(b -> editorStatus().startsWith("Change redone; the site was analysed again"));
        assertThat(storedRods(id)).hasSize(1);
        assertThat(Double.parseDouble(exposedRoof())).isLessThan(Double.parseDouble(before));
        assertThat(browser.findElement(By.id("plan-status")).getText()).doesNotStartWith("No verdict");
    }

    private void saveScreenshot() throws Exception {
        Path target = Path.of("target", "screenshots");
        Files.createDirectories(target);
        Files.write(target.resolve("plan-editing-analysis-pending.png"), browser.getScreenshotAs(OutputType.BYTES));
    }
}

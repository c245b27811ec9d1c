package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.sites.SiteService;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * In a real browser: the tower on its 12 m podium (sample site; walls 95 m, parapet top 96.2 m) at
 * level I (R = 20 m, IEC 62305-3:2010 Table 2). By IEC 62305-3:2010 5.2.3 only the upper 20 % of the
 * 96.2 m building, from 76.96 m, needs lateral air-termination; its facade bands below are drawn
 * apart, light and dashed, and the legend and the review list say why.
 */
class SideFlashBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    @Test
    void negligibleFacadeBandsAreDrawnApartAndTheRuleIsStated() throws Exception {
        long id = sites.create("meridian-tower.geojson", Files.readAllBytes(Path.of("sample-sites/meridian-tower.geojson")),
                "Tall tower", "I", null).id();
        analyses.run(id, null, null, null);

        browser.get("http://localhost:" + port + "/sites/" + id);
        assertThat(browser.findElements(By.cssSelector("#plan-drawing svg path.facade-band.side-flash-negligible")))
                .isNotEmpty();
        assertThat(browser.findElements(By.cssSelector("#plan-drawing svg path.facade-band[data-item-key]")))
                .isNotEmpty();
        WebElement legend = browser.findElement(By.cssSelector("#plan-drawing svg g.legend"));
        assertThat(legend.getText()).contains("flashes to the side negligible").contains("5.2.3");
        WebElement drawing = browser.findElement(By.id("plan-drawing"));
        browser.executeScript("arguments[0].scrollIntoView({block: 'start'});", drawing);
        saveScreenshot("side-flash-plan");

        WebElement note = browser.findElement(By.id("negligible-bands"));
        assertThat(note.getText()).contains("IEC 62305-3:2010 5.2.3").contains("lower than 60 m");
        browser.executeScript("arguments[0].scrollIntoView({block: 'center'});", note);
        saveScreenshot("side-flash-review-list");
    }

    private void saveScreenshot(String name) throws Exception {
        Path dir = Path.of("target", "screenshots");
        Files.createDirectories(dir);
        Files.write(dir.resolve(name + ".png"), browser.getScreenshotAs(OutputType.BYTES));
    }
}

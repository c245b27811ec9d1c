package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.junit.jupiter.api.Test;
import org.lpzplanner.sections.SiteCutService;
import org.lpzplanner.sites.SiteService;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * A designer saves the cut shown on the section page under a name, finds it in the list, opens it
 * and deletes it. Saves target/screenshots/saved-cuts.png.
 */
class SavedCutBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;
    @Autowired
    SiteCutService cuts;

    @Test
    void designerSavesOpensAndDeletesACut() throws Exception {
        long id = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Ferry shed", "III", null).id();
        browser.get("http://localhost:" + port + "/sites/" + id + "/section?x1=-10&y1=20&x2=90&y2=20");
        browser.findElement(By.cssSelector("#save-cut-form input[name=name]")).sendKeys("Across the quay");
        clickAndAwaitNewPage(By.cssSelector("#save-cut-form button[type=submit]"));

        String list = textOf(By.id("saved-cuts"));
        assertThat(list).contains("Across the quay").contains("from (-10, 20) to (90, 20) m");
        assertThat(cuts.cuts(id)).singleElement().satisfies(c -> assertThat(c.x2()).isEqualTo(90));
        Path shots = Files.createDirectories(Path.of("target", "screenshots"));
        browser.findElement(By.id("saved-cuts")).getLocation();
        Files.copy(browser.getScreenshotAs(OutputType.FILE).toPath(), shots.resolve("saved-cuts.png"),
                StandardCopyOption.REPLACE_EXISTING);

        clickAndAwaitNewPage(By.linkText("Open \"Across the quay\""));
        assertThat(textOf(By.id("section-cut"))).contains("100");
        clickAndAwaitNewPage(By.cssSelector("#saved-cuts form.inline button"));
        assertThat(textOf(By.id("saved-cuts"))).contains("No cuts saved yet");
        assertThat(cuts.cuts(id)).isEmpty();
    }
}

package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * In a real browser: rename a stored site with the form on its plan page, and find the new name,
 * shown as text, on the plan and in the site list; enter the address and designer for the report
 * cover (saves target/screenshots/cover-details.png).
 */
class RenameSiteBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;

    @Test
    void renamingASiteOnItsPlanPageShowsTheNewNameOnThePlanAndInTheList() throws Exception {
        StoredSite site = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Old shed name", "II", null);

        browser.get("http://localhost:" + port + "/sites/" + site.id());
        WebElement name = browser.findElement(By.cssSelector("#rename-form input[name=name]"));
        name.clear();
        name.sendKeys("Renamed <quay> shed");
        clickAndAwaitNewPage(By.cssSelector("#rename-form button[type=submit]"));

        assertThat(browser.getCurrentUrl()).endsWith("/sites/" + site.id());
        assertThat(browser.findElement(By.tagName("h1")).getText()).isEqualTo("Renamed <quay> shed");
        assertThat(sites.get(site.id()).name()).isEqualTo("Renamed <quay> shed");

        browser.get("http://localhost:" + port + "/");
        assertThat(browser.findElement(By.cssSelector("a[href='/sites/" + site.id() + "']")).getText())
                .isEqualTo("Renamed <quay> shed");
    }

    @Test
    void coverDetailsEnteredOnThePlanPageAreStoredAndShown() throws Exception {
        StoredSite site = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Cover shed", "II", null);

        browser.get("http://localhost:" + port + "/sites/" + site.id());
        browser.findElement(By.cssSelector("#cover-form input[name=address]")).sendKeys("4 Quay Row, Saltmarsh");
        browser.findElement(By.cssSelector("#cover-form input[name=designer]")).sendKeys("Mara <Q> Quill");
        clickAndAwaitNewPage(By.cssSelector("#cover-form button[type=submit]"));

        assertThat(browser.findElement(By.id("cover-details")).getText())
                .isEqualTo("Address: 4 Quay Row, Saltmarsh \u00b7 Designer: Mara <Q> Quill");
        assertThat(sites.get(site.id()).designer()).isEqualTo("Mara <Q> Quill");
        Path shots = Files.createDirectories(Path.of("target/screenshots"));
        Files.write(shots.resolve("cover-details.png"),
                browser.getScreenshotAs(org.openqa.selenium.OutputType.BYTES));
    }
}

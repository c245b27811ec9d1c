package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.transfer.SiteTransferService;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * In a real browser: import a site export with the form on the site list and land on the new
 * site's plan; a file that is not a site export shows the reason. Screenshots of the list with the
 * import form and of the refusal go to target/screenshots/.
 */
class SiteImportBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;
    @Autowired
    AnalysisService analyses;
    @Autowired
    SiteTransferService transfers;

    @Test
    void importingAnExportOpensTheNewSiteAndABadFileSaysWhy() throws Exception {
        StoredSite site = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Exported shed", "II", null);
        analyses.run(site.id(), null, null, "2");
        Path shots = Files.createDirectories(Path.of("target", "screenshots"));
        Path export = shots.resolve("exported-shed.site-export.json");
        Files.write(export, transfers.export(site.id()).content());
        Path bad = shots.resolve("not-an-export.json");
        Files.writeString(bad, "{\"type\": \"FeatureCollection\", \"features\": []}");

        browser.get("http://localhost:" + port + "/");
        assertThat(browser.findElement(By.cssSelector("a[href='/api/sites/" + site.id() + "/export']")).getText())
                .isEqualTo("Export site");
        Files.write(shots.resolve("site-list-import.png"), browser.getScreenshotAs(OutputType.BYTES));
        // the form's token goes in a hidden field of the body, never in the address
        assertThat(browser.findElement(By.id("import-form")).getDomAttribute("action")).isEqualTo("/sites/import");
        assertThat(browser.findElements(By.cssSelector("#import-form input[type=hidden][name=_csrf]"))).hasSize(1);
        browser.findElement(By.cssSelector("#import-form input[type=file]")).sendKeys(export.toAbsolutePath().toString());
        clickAndAwaitNewPage(By.cssSelector("#import-form button[type=submit]"));

        assertThat(browser.getCurrentUrl()).matches(".*/sites/\\d+$").doesNotEndWith("/sites/" + site.id());
        assertThat(browser.findElement(By.tagName("h1")).getText()).isEqualTo("Exported shed");

        browser.get("http://localhost:" + port + "/");
        browser.findElement(By.cssSelector("#import-form input[type=file]")).sendKeys(bad.toAbsolutePath().toString());
        clickAndAwaitNewPage(By.cssSelector("#import-form button[type=submit]"));
        assertThat(browser.findElement(By.id("import-error")).getText()).contains("format", "not a site export",
                "nothing was stored");
        Files.write(shots.resolve("import-refused.png"), browser.getScreenshotAs(OutputType.BYTES));
    }
}

package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisRepository;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.openqa.selenium.By;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * In a real browser: "analyse again" at another level runs in the background (the page stays, a
 * progress line appears) and the page shows the new result when it is stored.
 */
class BackgroundAnalysisBrowserTest extends BrowserTestBase {

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisRepository revisions;

    @Test
    void analysingAgainFollowsTheJobAndShowsTheNewLevel() throws Exception {
        StoredSite site = sites.create("brookfield-campus.geojson",
                Files.readAllBytes(Path.of("sample-sites/brookfield-campus.geojson")), "Campus in the background", "II", null);
        browser.get("http://localhost:" + port + "/sites/" + site.id());
        new Select(browser.findElement(By.cssSelector("#analysis-form select[name=level]"))).selectByValue("IV");
        browser.findElement(By.cssSelector("#analysis-form button[type=submit]")).click();

        new WebDriverWait(browser, Duration.ofSeconds(60)).until(b -> revisions.latest(site.id())
                .map(r -> r.level().name().equals("IV")).orElse(false)
                && b.findElement(By.id("plan-basis")).getText().contains("level IV"));
        assertThat(browser.getCurrentUrl()).endsWith("/sites/" + site.id());
        assertThat(browser.findElement(By.id("plan-basis")).getText()).contains("sphere radius 60 m");
        assertThat(browser.findElement(By.id("analysis-progress")).isDisplayed()).isFalse();
    }
}

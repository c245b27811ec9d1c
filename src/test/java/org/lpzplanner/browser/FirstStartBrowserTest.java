package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.chrome.ChromeDriver;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.annotation.DirtiesContext;

/**
 * A fresh install with the demo sites, as the README's run command gives it: the first visit
 * opens the setup page, which creates the administrator, signs in and shows the demo sites; after
 * signing out, the sign-in page takes the new account. Screenshots: target/screenshots/setup-page.png
 * and first-sites.png.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT, properties = "lpz.demo-data=true")
@DirtiesContext
class FirstStartBrowserTest {

    @LocalServerPort
    int port;

    ChromeDriver browser;

    @Autowired
    JdbcClient jdbc;

    @AfterEach
    void closeBrowser() {
        if (browser != null) {
            browser.quit();
        }
    }

    @Test
    void firstVisitSetsUpTheAdministratorAndShowsTheDemoSites() throws Exception {
        browser = BrowserSupport.start();
        String base = "http://localhost:" + port;
        browser.get(base + "/");
        assertThat(browser.getCurrentUrl()).endsWith("/setup");
        browser.findElement(By.name("name")).sendKeys("Ada Fielding");
        browser.findElement(By.name("email")).sendKeys("ada@example.org");
        browser.findElement(By.name("password")).sendKeys("a long enough password");
        browser.findElement(By.name("passwordAgain")).sendKeys("a long enough password");
        Path shots = Files.createDirectories(Path.of("target", "screenshots"));
        Files.copy(browser.getScreenshotAs(OutputType.FILE).toPath(), shots.resolve("setup-page.png"),
                StandardCopyOption.REPLACE_EXISTING);
        BrowserSupport.clickAndAwaitNewPage(browser, By.cssSelector("#setup-form button[type=submit]"));

        assertThat(browser.findElement(By.id("account-link")).getText()).contains("Ada Fielding", "administrator");
        assertThat(browser.findElement(By.tagName("body")).getText()).contains("Brookfield");
        Files.copy(browser.getScreenshotAs(OutputType.FILE).toPath(), shots.resolve("first-sites.png"),
                StandardCopyOption.REPLACE_EXISTING);

        BrowserSupport.clickAndAwaitNewPage(browser, By.cssSelector("#sign-out-form input[type=submit]"));
        assertThat(browser.findElement(By.id("signed-out")).isDisplayed()).isTrue();
        browser.findElement(By.name("email")).sendKeys("ada@example.org");
        browser.findElement(By.name("password")).sendKeys("a long enough password");
        BrowserSupport.clickAndAwaitNewPage(browser, By.cssSelector("#sign-in-form button[type=submit]"));
        assertThat(browser.findElement(By.id("account-link")).getText()).contains("Ada Fielding");
        // the session is kept in the database (Spring Session JDBC), where every app instance finds it
        assertThat(jdbc.sql("SELECT COUNT(*) FROM SPRING_SESSION WHERE PRINCIPAL_NAME = 'ada@example.org'")
                .query(Long.class).single()).isPositive();
        Files.copy(browser.getScreenshotAs(OutputType.FILE).toPath(), shots.resolve("signed-in.png"),
                StandardCopyOption.REPLACE_EXISTING);
    }
}

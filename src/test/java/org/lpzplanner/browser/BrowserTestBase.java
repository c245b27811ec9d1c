package org.lpzplanner.browser;

import java.time.Duration;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.accounts.SignedInAccount;
import org.lpzplanner.accounts.TestAccounts;
import org.openqa.selenium.By;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.security.test.context.TestSecurityContextHolder;

/**
 * The app on a random port and a fresh headless Chromium per test (see {@link BrowserSupport}),
 * signed in through the sign-in page as the test's {@link SignedIn} account (a designer of the
 * default team unless the class or method says otherwise); service calls on the test thread act
 * for the same team.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@SignedIn
abstract class BrowserTestBase {

    @LocalServerPort
    int port;

    ChromeDriver browser;

    @BeforeEach
    void openBrowser() {
        browser = BrowserSupport.start();
        signIn();
    }

    /** Signs the browser in as the test's account through the sign-in page. */
    void signIn() {
        SignedInAccount account = (SignedInAccount) TestSecurityContextHolder.getContext().getAuthentication()
                .getPrincipal();
        browser.get("http://localhost:" + port + "/login");
        browser.findElement(By.name("email")).sendKeys(account.email());
        browser.findElement(By.name("password")).sendKeys(TestAccounts.PASSWORD);
        browser.findElement(By.cssSelector("#sign-in-form button[type=submit]")).click();
        browser.findElement(By.id("account-link"));
    }

    /** See {@link BrowserSupport#clickAndAwaitNewPage}. */
    void clickAndAwaitNewPage(By target) {
        BrowserSupport.clickAndAwaitNewPage(browser, target);
    }

    WebDriverWait waitUpTo(int seconds) {
        return new WebDriverWait(browser, Duration.ofSeconds(seconds));
    }

    /** The exposed roof area as the plan page's summary shows it. */
    String exposedRoof() {
        return browser.findElement(By.cssSelector("#plan-summary td[data-summary=exposedRoofArea]")).getText();
    }

    /** See {@link BrowserSupport#textOf}. */
    String textOf(By target) {
        return BrowserSupport.textOf(browser, target);
    }

    @AfterEach
    void closeBrowser() {
        if (browser != null) {
            browser.quit();
        }
    }
}

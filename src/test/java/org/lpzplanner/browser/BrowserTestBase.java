package org.lpzplanner.browser;

import java.time.Duration;
import java.util.List;
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

    /** Screen position (CSS pixels) of a point in local metres, from the plan drawing's own frame. */
    double[] screenPoint(double x, double y) {
        @SuppressWarnings("unchecked")
        List<Number> p = (List<Number>) browser.executeScript(
                "const svg = document.querySelector('#plan-drawing svg'); const d = svg.dataset;"
                        + "const p = svg.createSVGPoint();"
                        + "p.x = Number(d.margin) + (arguments[0] - Number(d.originX)) * Number(d.scale);"
                        + "p.y = Number(d.margin) + (Number(d.originY) - arguments[1]) * Number(d.scale);"
                        + "const s = p.matrixTransform(svg.getScreenCTM()); return [s.x, s.y];", x, y);
        return new double[] {p.get(0).doubleValue(), p.get(1).doubleValue()};
    }

    /** The plan drawing scrolled to the middle of the window, and the point's position there, in whole pixels. */
    long[] viewportPoint(double x, double y) {
        browser.executeScript("document.querySelector('#plan-drawing svg').scrollIntoView({block: 'center'});");
        double[] p = screenPoint(x, y);
        return new long[] {Math.round(p[0]), Math.round(p[1])};
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

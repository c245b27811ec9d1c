package org.lpzplanner.browser;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.Assumptions;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * A real headless Chromium for browser tests, from the Debian packages {@code chromium} and
 * {@code chromium-driver}. Where they are missing the tests are skipped with a message, except
 * under CI (environment variable CI=true), where a missing browser fails the run.
 */
final class BrowserSupport {

    static final Path BROWSER = Path.of("/usr/bin/chromium");
    static final Path DRIVER = Path.of("/usr/bin/chromedriver");

    private BrowserSupport() {
    }

    static ChromeDriver start() {
        boolean present = Files.isExecutable(BROWSER) && Files.isExecutable(DRIVER);
        if (!present && "true".equalsIgnoreCase(System.getenv("CI"))) {
            throw new IllegalStateException("browser tests need " + BROWSER + " and " + DRIVER
                    + " (Debian packages chromium and chromium-driver); .ci/run installs them");
        }
        Assumptions.assumeTrue(present, "browser tests skipped: install the Debian packages chromium and chromium-driver");
        ChromeOptions options = new ChromeOptions();
        options.setBinary(BROWSER.toFile());
        options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
                "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--no-first-run", "--window-size=1400,1400");
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(DRIVER.toFile())
                .usingAnyFreePort().build();
        ChromeDriver driver = new ChromeDriver(service, options);
        driver.manage().timeouts().implicitlyWait(Duration.ofSeconds(5));
        return driver;
    }

    /**
     * Clicks what submits a form or follows a link and waits until the browser has left the old
     * page, so the next lookup reads the new page and not an element of the one being replaced.
     */
    static void clickAndAwaitNewPage(ChromeDriver browser, By target) {
        WebElement oldPage = null;
        // the page may still be settling from the step before (the element found then belongs to a
        // document already gone, and the click does not happen): look it up again and retry
        for (int attempt = 1; oldPage == null; attempt++) {
            try {
                WebElement html = browser.findElement(By.tagName("html"));
                browser.findElement(target).click();
                oldPage = html;
            } catch (org.openqa.selenium.StaleElementReferenceException e) {
                retryOrThrow(attempt, e);
            } catch (org.openqa.selenium.WebDriverException e) {
                if (e.getMessage() == null || !e.getMessage().contains("does not belong to the document")) {
                    throw e;
                }
                retryOrThrow(attempt, e);
            }
        }
        WebDriverWait wait = new WebDriverWait(browser, Duration.ofSeconds(30));
        wait.until(ExpectedConditions.stalenessOf(oldPage));
        wait.until(b -> "complete".equals(((org.openqa.selenium.JavascriptExecutor) b)
                .executeScript("return document.readyState")));
    }

    private static void retryOrThrow(int attempt, RuntimeException e) {
        if (attempt >= 5) {
            throw e;
        }
        try {
            Thread.sleep(200);
        } catch (InterruptedException interrupted) {
            Thread.currentThread().interrupt();
            throw e;
        }
    }

    /**
     * The text of an element, looked up again if the page replaced it between finding and reading
     * (a navigation that was still settling).
     */
    static String textOf(ChromeDriver browser, By target) {
        return new WebDriverWait(browser, Duration.ofSeconds(10))
                .ignoring(org.openqa.selenium.StaleElementReferenceException.class)
                .until(b -> b.findElement(target).getText());
    }
}

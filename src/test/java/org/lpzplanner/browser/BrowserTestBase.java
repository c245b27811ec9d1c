package org.lpzplanner.browser;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.openqa.selenium.chrome.ChromeDriver;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/** The app on a random port and a fresh headless Chromium per test (see {@link BrowserSupport}). */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
abstract class BrowserTestBase {

    @LocalServerPort
    int port;

    ChromeDriver browser;

    @BeforeEach
    void openBrowser() {
        browser = BrowserSupport.start();
    }

    @AfterEach
    void closeBrowser() {
        if (browser != null) {
            browser.quit();
        }
    }
}

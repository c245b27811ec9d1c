package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.Account;
import org.lpzplanner.accounts.AccountService;
import org.lpzplanner.accounts.Role;
import org.lpzplanner.accounts.SignedIn;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.support.ui.Select;
import org.springframework.beans.factory.annotation.Autowired;

/**
 * An administrator adds a team and a reviewer account on the admin page; the new account is
 * listed with its role. Disabling an account ends its open sessions. Screenshot:
 * target/screenshots/admin-page.png.
 */
@SignedIn(role = Role.ADMIN)
class AdminPageBrowserTest extends BrowserTestBase {

    @Autowired
    AccountService accounts;

    @Test
    void administratorAddsATeamAndAReviewer() throws Exception {
        browser.get("http://localhost:" + port + "/admin");
        browser.findElement(By.cssSelector("#new-team-form input[name=name]")).sendKeys("Harbour projects");
        clickAndAwaitNewPage(By.cssSelector("#new-team-form button"));
        assertThat(browser.findElement(By.id("team-list")).getText()).contains("Harbour projects");

        browser.findElement(By.cssSelector("#new-account-form input[name=email]")).sendKeys("rita.review@example.org");
        browser.findElement(By.cssSelector("#new-account-form input[name=name]")).sendKeys("Rita Review");
        browser.findElement(By.cssSelector("#new-account-form input[name=password]")).sendKeys("first password 2026");
        new Select(browser.findElement(By.cssSelector("#new-account-form select[name=role]"))).selectByValue("REVIEWER");
        new Select(browser.findElement(By.cssSelector("#new-account-form select[name=team]")))
                .selectByVisibleText("Harbour projects");
        clickAndAwaitNewPage(By.cssSelector("#new-account-form button"));

        assertThat(browser.findElement(By.cssSelector("tr[data-email='rita.review@example.org']")).getText())
                .contains("Rita Review");
        assertThat(accounts.list()).anySatisfy(a -> {
            assertThat(a.email()).isEqualTo("rita.review@example.org");
            assertThat(a.role()).isEqualTo(Role.REVIEWER);
            assertThat(accounts.team(a.teamId()).name()).isEqualTo("Harbour projects");
        });
        Path shots = Files.createDirectories(Path.of("target", "screenshots"));
        Files.copy(browser.getScreenshotAs(OutputType.FILE).toPath(), shots.resolve("admin-page.png"),
                StandardCopyOption.REPLACE_EXISTING);
    }

    @Test
    @SignedIn(role = Role.DESIGNER, email = "leaving@default.test")
    void disablingAnAccountEndsItsSessionAtOnce() throws Exception {
        browser.get("http://localhost:" + port + "/");
        assertThat(browser.findElements(By.id("account-link"))).isNotEmpty();
        Account leaving = accounts.list().stream().filter(a -> a.email().equals("leaving@default.test")).findFirst()
                .orElseThrow();
        accounts.update(leaving.id(), Role.DESIGNER, leaving.teamId(), false);

        browser.get("http://localhost:" + port + "/");
        assertThat(browser.getCurrentUrl()).endsWith("/login");
    }
}

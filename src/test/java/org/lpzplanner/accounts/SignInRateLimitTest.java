package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.security.test.web.servlet.setup.SecurityMockMvcConfigurers.springSecurity;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;

import java.time.Clock;
import java.time.Duration;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.setup.MockMvcBuilders;
import org.springframework.web.context.WebApplicationContext;

/**
 * Failed sign-ins are limited per account (5 in 15 minutes) and per address (here 8, to keep the
 * test short); the count lives in the database, so a second app instance sees it too.
 */
@SpringBootTest(properties = "lpz.sign-in.max-failures-per-address=8")
class SignInRateLimitTest {

    @Autowired
    WebApplicationContext context;

    @Autowired
    AccountService accounts;

    @Autowired
    AccountRepository repository;

    @Autowired
    JdbcClient jdbc;

    @Autowired
    Clock clock;

    MockMvc mvc;

    @BeforeEach
    void plainMockMvc() {
        mvc = MockMvcBuilders.webAppContextSetup(context).apply(springSecurity()).build();
        jdbc.sql("DELETE FROM sign_in_attempts").update();
    }

    private String account(String email) {
        new TestAccounts(accounts, repository).account(Role.DESIGNER, "", email);
        return email;
    }

    private void signIn(String email, String password, String address, String expectedRedirect) throws Exception {
        mvc.perform(post("/login").param("email", email).param("password", password).with(csrf())
                .with(r -> {
                    r.setRemoteAddr(address);
                    return r;
                }))
                .andExpect(redirectedUrl(expectedRedirect));
    }

    @Test
    void fiveFailuresLockTheAccountEvenForTheRightPasswordAndFromAnotherAddress() throws Exception {
        String email = account("limited@default.test");
        for (int i = 0; i < 5; i++) {
            signIn(email, "wrong password " + i, "198.51.100.1", "/login?error");
        }
        signIn(email, TestAccounts.PASSWORD, "198.51.100.1", "/login?throttled");
        signIn(email, TestAccounts.PASSWORD, "198.51.100.2", "/login?throttled");

        // a second app instance on the same database refuses too
        SignInThrottle otherInstance = new SignInThrottle(jdbc, clock, 5, 8, Duration.ofMinutes(15));
        assertThatThrownBy(() -> otherInstance.check(email, "203.0.113.9")).isInstanceOf(SignInThrottledException.class);
        // after the window the account may try again
        SignInThrottle later = new SignInThrottle(jdbc, Clock.offset(clock, Duration.ofMinutes(16)), 5, 8,
                Duration.ofMinutes(15));
        later.check(email, "198.51.100.1");
    }

    @Test
    void aSuccessBeforeTheLimitClearsTheAccountsFailures() throws Exception {
        String email = account("forgetful@default.test");
        for (int i = 0; i < 4; i++) {
            signIn(email, "wrong " + i, "198.51.100.3", "/login?error");
        }
        signIn(email, TestAccounts.PASSWORD, "198.51.100.3", "/");
        signIn(email, "wrong again", "198.51.100.3", "/login?error");
        signIn(email, TestAccounts.PASSWORD, "198.51.100.3", "/");
    }

    @Test
    void oneAddressTryingManyAccountsIsStopped() throws Exception {
        for (int i = 0; i < 8; i++) {
            signIn("guess" + i + "@example.org", "password" + i, "192.0.2.77", "/login?error");
        }
        String real = account("victim@default.test");
        signIn(real, TestAccounts.PASSWORD, "192.0.2.77", "/login?throttled");
        signIn(real, TestAccounts.PASSWORD, "192.0.2.78", "/");
        // the eight failures are stored; the refused attempt was not even checked, so it is not counted
        assertThat(jdbc.sql("SELECT COUNT(*) FROM sign_in_attempts WHERE address = '192.0.2.77'")
                .query(Long.class).single()).isEqualTo(8);
    }
}

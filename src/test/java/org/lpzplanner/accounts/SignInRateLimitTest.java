package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.setup.SecurityMockMvcConfigurers.springSecurity;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.setup.MockMvcBuilders;
import org.springframework.web.context.WebApplicationContext;

/**
 * Failed sign-ins through the sign-in form: 5 in a row lock the account (here the address limit is
 * 8, to keep the test short); an address with many failures does not lock out the right password of
 * an account that is not locked itself, but a wrong one from there locks its account at once.
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
        signIn(email, TestAccounts.PASSWORD, "198.51.100.1", "/login?throttled=1");
        signIn(email, TestAccounts.PASSWORD, "198.51.100.2", "/login?throttled=1");
        String page = mvc.perform(get("/login").param("throttled", "1")).andReturn().getResponse()
                .getContentAsString();
        assertThat(page).contains("id=\"sign-in-throttled\"", "Try again in 1 minute");
    }

    @Test
    void aSuccessBeforeTheLimitClearsTheAccountsFailures() throws Exception {
        String email = account("forgetful@default.test");
        for (int i = 0; i < 4; i++) {
            signIn(email, "wrong " + i, "198.51.100.3", "/login?error");
        }
        signIn(email, TestAccounts.PASSWORD, "198.51.100.3", "/");
        for (int i = 0; i < 4; i++) {
            signIn(email, "wrong again " + i, "198.51.100.3", "/login?error");
        }
        signIn(email, TestAccounts.PASSWORD, "198.51.100.3", "/");
    }

    @Test
    void anAddressWithManyFailuresStillLetsTheRightPasswordInButLocksOnAWrongOne() throws Exception {
        for (int i = 0; i < 8; i++) {
            signIn("guess" + i + "@example.org", "password" + i, "192.0.2.77", "/login?error");
        }
        // someone else behind the same address, with the right password, is not locked out
        String colleague = account("colleague@default.test");
        signIn(colleague, TestAccounts.PASSWORD, "192.0.2.77", "/");
        // a wrong password from that address locks its account at once, wherever the next try comes from
        String typist = account("typist@default.test");
        signIn(typist, "not quite right", "192.0.2.77", "/login?error");
        signIn(typist, TestAccounts.PASSWORD, "192.0.2.77", "/login?throttled=1");
        signIn(typist, TestAccounts.PASSWORD, "192.0.2.78", "/login?throttled=1");
        // an account not tried from there is untouched
        signIn(account("elsewhere@default.test"), TestAccounts.PASSWORD, "192.0.2.78", "/");
    }

    @Test
    void theSignInPageSaysTheWaitOnlyWhenItIsAWholeNumber() throws Exception {
        assertThat(mvc.perform(get("/login").param("throttled", "7")).andReturn().getResponse().getContentAsString())
                .contains("Try again in 7 minutes");
        assertThat(mvc.perform(get("/login").param("throttled", "<b>soon</b>")).andReturn().getResponse()
                .getContentAsString()).contains("id=\"sign-in-throttled\"").doesNotContain("soon");
    }
}

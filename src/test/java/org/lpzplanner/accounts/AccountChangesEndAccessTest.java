package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.jdbc.core.simple.JdbcClient;

/**
 * Through the real servlet container and the stored sessions: a password change ends every session
 * of the account (the one it was made in too) and revokes its API tokens; disabling an account
 * ends its sessions and revokes its tokens for good, so enabling it again brings none of them back.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@SignedIn(role = Role.ADMIN)
class AccountChangesEndAccessTest {

    private static final String NEW_PASSWORD = "a new and longer passphrase";

    @LocalServerPort
    int port;

    @Autowired
    AccountService accounts;

    @Autowired
    AccountRepository repository;

    @Autowired
    ApiTokenService tokens;

    @Autowired
    JdbcClient jdbc;

    private long storedSessionsOf(String email) {
        return jdbc.sql("SELECT COUNT(*) FROM SPRING_SESSION WHERE PRINCIPAL_NAME = ?").param(email)
                .query(Long.class).single();
    }

    private int apiStatus(String token) throws Exception {
        return new WebClient(port).send(HttpRequest.newBuilder(new WebClient(port).uri("/api/sites"))
                .header("Authorization", "Bearer " + token).GET()).statusCode();
    }

    private static void assertSignedOut(WebClient client) throws Exception {
        HttpResponse<String> r = client.get("/");
        assertThat(r.statusCode()).isEqualTo(302);
        assertThat(WebClient.location(r)).isEqualTo("/login");
    }

    @Test
    void changingThePasswordEndsEverySessionOfTheAccountAndRevokesItsTokens() throws Exception {
        Account account = new TestAccounts(accounts, repository).account(Role.DESIGNER, "", "changer@default.test");
        String token = tokens.create(account.id(), "script");
        WebClient office = WebClient.signedIn(port, account.email());
        WebClient laptop = WebClient.signedIn(port, account.email());
        assertThat(storedSessionsOf(account.email())).isEqualTo(2);
        assertThat(apiStatus(token)).isEqualTo(200);

        String form = WebClient.hiddenToken(office.get("/account").body());
        HttpResponse<String> changed = office.postForm("/account/password", Map.of("_csrf", form,
                "current", TestAccounts.PASSWORD, "password", NEW_PASSWORD, "passwordAgain", NEW_PASSWORD));

        assertThat(changed.statusCode()).isEqualTo(302);
        assertThat(WebClient.location(changed)).isEqualTo("/login?passwordChanged");
        assertThat(office.get("/login?passwordChanged").body()).contains("id=\"password-changed\"");
        assertSignedOut(office);
        assertSignedOut(laptop);
        assertThat(storedSessionsOf(account.email())).isZero();
        assertThat(apiStatus(token)).isEqualTo(401);
        assertThat(tokens.list(account.id())).isEmpty();

        WebClient again = new WebClient(port);
        assertThat(WebClient.location(again.signIn(account.email(), TestAccounts.PASSWORD))).isEqualTo("/login?error");
        assertThat(WebClient.location(again.signIn(account.email(), NEW_PASSWORD))).isEqualTo("/");
    }

    @Test
    void aRefusedPasswordChangeEndsNothing() throws Exception {
        Account account = new TestAccounts(accounts, repository).account(Role.DESIGNER, "", "keeper@default.test");
        String token = tokens.create(account.id(), "script");
        WebClient office = WebClient.signedIn(port, account.email());
        WebClient laptop = WebClient.signedIn(port, account.email());

        String form = WebClient.hiddenToken(office.get("/account").body());
        HttpResponse<String> refused = office.postForm("/account/password", Map.of("_csrf", form,
                "current", "not the password at all", "password", NEW_PASSWORD, "passwordAgain", NEW_PASSWORD));

        assertThat(refused.statusCode()).isEqualTo(400);
        assertThat(refused.body()).contains("id=\"password-error\"", "the current password is not right");
        assertThat(office.get("/").statusCode()).isEqualTo(200);
        assertThat(laptop.get("/").statusCode()).isEqualTo(200);
        assertThat(apiStatus(token)).isEqualTo(200);
    }

    @Test
    void disablingAnAccountEndsItsSessionsAndRevokesItsTokensForGood() throws Exception {
        Account account = new TestAccounts(accounts, repository).account(Role.DESIGNER, "", "leaver@default.test");
        String token = tokens.create(account.id(), "script");
        WebClient office = WebClient.signedIn(port, account.email());
        WebClient laptop = WebClient.signedIn(port, account.email());

        accounts.update(account.id(), Role.DESIGNER, account.teamId(), false);

        assertSignedOut(office);
        assertSignedOut(laptop);
        assertThat(storedSessionsOf(account.email())).isZero();
        assertThat(apiStatus(token)).isEqualTo(401);

        accounts.update(account.id(), Role.DESIGNER, account.teamId(), true);
        assertThat(apiStatus(token)).as("a token of a disabled account does not come back").isEqualTo(401);
        assertThat(tokens.list(account.id())).isEmpty();
    }
}

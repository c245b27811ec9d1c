package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.jdbc.core.simple.JdbcClient;

/**
 * A personal API token acts on the JSON API only, through the real servlet container and the
 * stored sessions: on a page (the account page that makes tokens, the admin page that makes
 * accounts, any other) it is refused with a message and changes nothing, and no request that
 * carries a token ever opens a session.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@SignedIn(role = Role.ADMIN)
class ApiTokenScopeTest {

    @LocalServerPort
    int port;

    @Autowired
    ApiTokenService tokens;

    @Autowired
    AccountService accounts;

    @Autowired
    JdbcClient jdbc;

    long accountId;
    String token;

    @BeforeEach
    void tokenOfTheAdministrator() {
        accountId = CurrentAccount.signedIn().orElseThrow().accountId();
        token = tokens.create(accountId, "scope check");
    }

    private long storedSessions() {
        return jdbc.sql("SELECT COUNT(*) FROM SPRING_SESSION").query(Long.class).single();
    }

    private HttpResponse<String> withToken(HttpRequest.Builder request) throws Exception {
        return new WebClient(port).send(request.header("Authorization", "Bearer " + token));
    }

    private HttpResponse<String> formWithToken(String path, Map<String, String> fields) throws Exception {
        return withToken(HttpRequest.newBuilder(new WebClient(port).uri(path))
                .header("Content-Type", "application/x-www-form-urlencoded")
                .POST(HttpRequest.BodyPublishers.ofString(WebClient.formBody(fields))));
    }

    private static void assertRefusedOnAPage(HttpResponse<String> r) {
        String label = r.request().method() + " " + r.uri().getPath();
        assertThat(r.statusCode()).as(label).isEqualTo(403);
        assertThat(r.body()).as(label).contains("API token", "/api/", "sign in");
        assertThat(r.headers().allValues("Set-Cookie")).as(label).isEmpty();
    }

    @Test
    void aTokenCannotCreateMoreTokensThroughTheAccountPage() throws Exception {
        long sessions = storedSessions();
        int before = tokens.list(accountId).size();
        HttpResponse<String> r = formWithToken("/account/tokens", Map.of("label", "outlives its parent"));

        assertRefusedOnAPage(r);
        assertThat(r.body()).doesNotContain(ApiTokenService.PREFIX);
        assertThat(tokens.list(accountId)).hasSize(before).extracting(ApiToken::label)
                .doesNotContain("outlives its parent");
        assertThat(storedSessions()).isEqualTo(sessions);
    }

    @Test
    void anAdministratorsTokenCannotManageAccountsOrTeamsThroughTheAdminPage() throws Exception {
        long team = accounts.defaultTeam().id();
        assertRefusedOnAPage(formWithToken("/admin/accounts", Map.of("email", "made.by.token@example.org",
                "name", "Made by token", "password", "a long enough password", "role", "ADMIN",
                "team", String.valueOf(team))));
        assertRefusedOnAPage(formWithToken("/admin/teams", Map.of("name", "Made by token")));
        assertRefusedOnAPage(formWithToken("/admin/accounts/" + accountId, Map.of("role", "ADMIN",
                "team", String.valueOf(team))));

        assertThat(accounts.list()).extracting(Account::email).doesNotContain("made.by.token@example.org");
        assertThat(accounts.teams()).extracting(Team::name).doesNotContain("Made by token");
        assertThat(accounts.get(accountId).enabled()).as("the form without 'enabled' would disable").isTrue();
    }

    @Test
    void aTokenOnAnyAddressOutsideTheApiIsRefusedAndOpensNoSession() throws Exception {
        long sessions = storedSessions();
        for (String path : List.of("/", "/account", "/admin", "/sites/1", "/login", "/setup", "/error",
                "/css/app.css", "/actuator/health")) {
            assertRefusedOnAPage(withToken(HttpRequest.newBuilder(new WebClient(port).uri(path)).GET()));
        }
        assertRefusedOnAPage(formWithToken("/logout", Map.of()));
        assertRefusedOnAPage(formWithToken("/sites/1/comments", Map.of("comment", "by token")));
        // a token the app does not know is refused there in the same words
        token = "lpz_unknown";
        assertRefusedOnAPage(withToken(HttpRequest.newBuilder(new WebClient(port).uri("/account")).GET()));
        assertThat(storedSessions()).isEqualTo(sessions);
    }

    @Test
    void aTokenOnTheApiWorksWithoutOpeningASession() throws Exception {
        long sessions = storedSessions();
        WebClient client = new WebClient(port);
        String boundary = "lpz-scope";
        byte[] hall = Files.readAllBytes(Path.of("sample-sites", "millbrook-hall.geojson"));
        String body = "--" + boundary + "\r\nContent-Disposition: form-data; name=\"file\"; filename=\"hall.geojson\"\r\n"
                + "Content-Type: application/geo+json\r\n\r\n" + new String(hall, StandardCharsets.UTF_8) + "\r\n--"
                + boundary + "--\r\n";

        List<HttpResponse<String>> answers = List.of(
                withToken(HttpRequest.newBuilder(client.uri("/api/sites")).GET()),
                withToken(HttpRequest.newBuilder(client.uri("/api/sites"))
                        .header("Content-Type", "multipart/form-data; boundary=" + boundary)
                        .POST(HttpRequest.BodyPublishers.ofString(body))),
                withToken(HttpRequest.newBuilder(client.uri("/api/sites/987654")).GET()),
                // an error answered through the container's error page, asked for as a browser would
                withToken(HttpRequest.newBuilder(client.uri("/api/no-such-thing")).header("Accept", "text/html").GET()),
                withToken(HttpRequest.newBuilder(client.uri("/api/sites")).header("Content-Type", "application/json")
                        .method("PATCH", HttpRequest.BodyPublishers.ofString("{"))));

        assertThat(answers).extracting(HttpResponse::statusCode).containsExactly(200, 201, 404, 404, 405);
        for (HttpResponse<String> r : answers) {
            assertThat(r.headers().allValues("Set-Cookie")).as(r.uri().getPath()).isEmpty();
        }
        assertThat(storedSessions()).isEqualTo(sessions);
    }
}

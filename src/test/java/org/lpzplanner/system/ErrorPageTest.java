package org.lpzplanner.system;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.AccountRepository;
import org.lpzplanner.accounts.AccountService;
import org.lpzplanner.accounts.Role;
import org.lpzplanner.accounts.TestAccounts;
import org.lpzplanner.accounts.WebClient;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * The error page, through the real servlet container: asked for directly it is a page that does
 * not exist (404 with the page that says so, or JSON), not a failure (500); a real error, such as
 * an address the app does not have, still shows it with its own status.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class ErrorPageTest {

    @LocalServerPort
    int port;

    @Autowired
    AccountService accounts;

    @Autowired
    AccountRepository repository;

    private static HttpResponse<String> get(WebClient client, String path, String accept) throws Exception {
        return client.send(HttpRequest.newBuilder(client.uri(path)).header("Accept", accept).GET());
    }

    @Test
    void theErrorPageAskedForDirectlyAnswers404() throws Exception {
        WebClient anonymous = new WebClient(port);
        HttpResponse<String> page = get(anonymous, "/error", "text/html");
        assertThat(page.statusCode()).isEqualTo(404);
        assertThat(page.body()).contains("This page does not exist.").doesNotContain("Exception");
        assertThat(get(anonymous, "/error", "application/json").statusCode()).isEqualTo(404);

        String email = new TestAccounts(accounts, repository).account(Role.DESIGNER, "", "").email();
        WebClient signedIn = WebClient.signedIn(port, email);
        assertThat(get(signedIn, "/error", "text/html").statusCode()).isEqualTo(404);
        HttpResponse<String> missing = get(signedIn, "/no-such-page", "text/html");
        assertThat(missing.statusCode()).isEqualTo(404);
        assertThat(missing.body()).contains("This page does not exist.");
    }
}

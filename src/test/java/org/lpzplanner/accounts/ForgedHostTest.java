package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * Requests whose {@code Host} header names another server, sent through the real servlet
 * container: no redirect of the sign-in (to the sign-in page, after signing in, back to the page
 * first asked for, after a failure, after signing out) or of a page names that server. Redirects
 * are relative, so they always lead back to the server the browser is talking to.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class ForgedHostTest {

    private static final String FORGED = "evil.example";

    @LocalServerPort
    int port;

    @Autowired
    AccountService accounts;

    @Autowired
    AccountRepository repository;

    /** One HTTP/1.0 exchange (no chunked answer), with the forged Host. */
    private record Answer(int status, List<String> headers, String body) {

        String header(String name) {
            return headers.stream().filter(h -> h.regionMatches(true, 0, name + ":", 0, name.length() + 1))
                    .map(h -> h.substring(name.length() + 1).strip()).findFirst().orElse(null);
        }

        String sessionCookie() {
            String cookie = header("Set-Cookie");
            return cookie == null ? null : cookie.substring(0, cookie.indexOf(';'));
        }
    }

    private Answer send(String method, String path, String cookie, String form) throws IOException {
        try (Socket socket = new Socket("127.0.0.1", port)) {
            socket.setSoTimeout(30_000);
            StringBuilder request = new StringBuilder(method + " " + path + " HTTP/1.0\r\nHost: " + FORGED + "\r\n");
            if (cookie != null) {
                request.append("Cookie: ").append(cookie).append("\r\n");
            }
            byte[] body = form == null ? new byte[0] : form.getBytes(StandardCharsets.UTF_8);
            if (form != null) {
                request.append("Content-Type: application/x-www-form-urlencoded\r\nContent-Length: ")
                        .append(body.length).append("\r\n");
            }
            request.append("\r\n");
            OutputStream out = socket.getOutputStream();
            out.write(request.toString().getBytes(StandardCharsets.US_ASCII));
            out.write(body);
            out.flush();
            InputStream in = socket.getInputStream();
            ByteArrayOutputStream all = new ByteArrayOutputStream();
            in.transferTo(all);
            String text = all.toString(StandardCharsets.UTF_8);
            int end = text.indexOf("\r\n\r\n");
            String[] lines = text.substring(0, end).split("\r\n");
            return new Answer(Integer.parseInt(lines[0].split(" ")[1]), List.of(lines).subList(1, lines.length),
                    text.substring(end + 4));
        }
    }

    private static String token(String page) {
        Matcher m = Pattern.compile("name=\"_csrf\"\\s+value=\"([^\"]+)\"").matcher(page);
        assertThat(m.find()).isTrue();
        return m.group(1);
    }

    private static String enc(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }

    private static void assertRelative(Answer answer, String expected) {
        assertThat(answer.status()).isEqualTo(302);
        assertThat(answer.header("Location")).isEqualTo(expected).doesNotContain(FORGED);
    }

    @Test
    void signInRedirectsNeverNameTheForgedHost() throws IOException {
        String email = new TestAccounts(accounts, repository).account(Role.DESIGNER, "", "forged.host@default.test")
                .email();
        List<String> seen = new ArrayList<>();

        Answer asked = send("GET", "/account", null, null);
        assertRelative(asked, "/login");
        String cookie = asked.sessionCookie();
        seen.add(asked.header("Location"));

        Answer login = send("GET", "/login", cookie, null);
        assertThat(login.status()).isEqualTo(200);
        Answer wrong = send("POST", "/login", cookie, "_csrf=" + enc(token(login.body())) + "&email=" + enc(email)
                + "&password=wrong");
        assertRelative(wrong, "/login?error");

        login = send("GET", "/login", cookie, null);
        Answer signedIn = send("POST", "/login", cookie, "_csrf=" + enc(token(login.body())) + "&email=" + enc(email)
                + "&password=" + enc(TestAccounts.PASSWORD));
        assertRelative(signedIn, "/account");
        cookie = signedIn.sessionCookie() == null ? cookie : signedIn.sessionCookie();

        Answer page = send("GET", "/account", cookie, null);
        assertThat(page.status()).isEqualTo(200);
        assertRelative(send("GET", "/setup", cookie, null), "/login");
        Answer signedOut = send("POST", "/logout", cookie, "_csrf=" + enc(token(page.body())));
        assertRelative(signedOut, "/login?signedOut");
    }

    @Test
    void signingInWithoutAPageAskedForFirstLeadsToTheSiteList() throws IOException {
        String email = new TestAccounts(accounts, repository).account(Role.DESIGNER, "", "forged.home@default.test")
                .email();
        Answer login = send("GET", "/login", null, null);
        Answer signedIn = send("POST", "/login", login.sessionCookie(), "_csrf=" + enc(token(login.body()))
                + "&email=" + enc(email) + "&password=" + enc(TestAccounts.PASSWORD));
        assertRelative(signedIn, "/");
    }
}

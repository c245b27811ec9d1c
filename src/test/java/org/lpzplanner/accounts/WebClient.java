package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.net.CookieManager;
import java.net.HttpCookie;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * A client of the app on a real port that keeps its cookies as a browser does and follows no
 * redirects (so that tests see each {@code Location}): signs in on the sign-in page and reads the
 * form token from a page's hidden field.
 */
public final class WebClient {

    private static final Pattern HIDDEN_TOKEN = Pattern.compile("name=\"_csrf\"\\s+value=\"([^\"]+)\"");

    private final CookieManager cookies = new CookieManager();
    private final HttpClient http = HttpClient.newBuilder().cookieHandler(cookies)
            .followRedirects(HttpClient.Redirect.NEVER).connectTimeout(Duration.ofSeconds(10)).build();
    private final String base;

    public WebClient(int port) {
        this.base = "http://127.0.0.1:" + port;
    }

    /** A client signed in with the e-mail and the test accounts' password. */
    public static WebClient signedIn(int port, String email) throws IOException, InterruptedException {
        WebClient client = new WebClient(port);
        HttpResponse<String> r = client.signIn(email, TestAccounts.PASSWORD);
        assertThat(location(r)).as("sign-in of " + email).isEqualTo("/");
        return client;
    }

    /** Path and query of the answer's {@code Location}, whether written relative or absolute. */
    public static String location(HttpResponse<?> response) {
        String location = response.headers().firstValue("Location").orElse(null);
        if (location == null) {
            return null;
        }
        URI target = response.uri().resolve(location);
        return target.getRawPath() + (target.getRawQuery() == null ? "" : "?" + target.getRawQuery());
    }

    /** Posts the sign-in form with the token of the sign-in page. */
    public HttpResponse<String> signIn(String email, String password) throws IOException, InterruptedException {
        String token = hiddenToken(get("/login").body());
        return postForm("/login", Map.of("_csrf", token, "email", email, "password", password));
    }

    public HttpResponse<String> get(String path) throws IOException, InterruptedException {
        return send(HttpRequest.newBuilder(uri(path)).GET());
    }

    public HttpResponse<String> postForm(String path, Map<String, String> fields)
            throws IOException, InterruptedException {
        return send(HttpRequest.newBuilder(uri(path)).header("Content-Type", "application/x-www-form-urlencoded")
                .POST(HttpRequest.BodyPublishers.ofString(formBody(fields))));
    }

    public HttpResponse<String> send(HttpRequest.Builder request) throws IOException, InterruptedException {
        return http.send(request.timeout(Duration.ofSeconds(60)).build(), HttpResponse.BodyHandlers.ofString());
    }

    public URI uri(String path) {
        return URI.create(base + path);
    }

    /** The session cookie's value, or null without one. */
    public String sessionCookie() {
        return cookies.getCookieStore().getCookies().stream().filter(c -> c.getName().equals("SESSION"))
                .map(HttpCookie::getValue).findFirst().orElse(null);
    }

    /** The value of the first hidden {@code _csrf} field of a page. */
    public static String hiddenToken(String page) {
        Matcher m = HIDDEN_TOKEN.matcher(page);
        assertThat(m.find()).as("a form with its token in a hidden field").isTrue();
        return m.group(1);
    }

    static String formBody(Map<String, String> fields) {
        return new LinkedHashMap<>(fields).entrySet().stream()
                .map(e -> URLEncoder.encode(e.getKey(), StandardCharsets.UTF_8) + "="
                        + URLEncoder.encode(e.getValue(), StandardCharsets.UTF_8))
                .collect(Collectors.joining("&"));
    }
}

package org.lpzplanner.bench;

import java.io.IOException;
import java.net.CookieManager;
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
 * Obtains a personal API token from a running app the way a person does: signs in on the sign-in
 * page and creates a token on the account page. Clients that run outside the app (the load script,
 * tests that start the app in its own JVM) then send {@code Authorization: Bearer <token>} to the
 * JSON API; pages take only a signed-in session ({@link #signIn}).
 */
public final class ApiTokenOverHttp {

    private static final Pattern CSRF = Pattern.compile("name=\"_csrf\"\\s+value=\"([^\"]+)\"");
    private static final Pattern TOKEN = Pattern.compile("id=\"new-token\">(lpz_[A-Za-z0-9_-]+)<");

    private ApiTokenOverHttp() {
    }

    /** Signs in with the e-mail and password and returns a new API token of that account. */
    public static String create(URI base, String email, String password, String label)
            throws IOException, InterruptedException {
        return create(base, signIn(base, email, password), label);
    }

    /** Signs in on the sign-in page; the client returned holds the session cookie, as a browser does. */
    public static HttpClient signIn(URI base, String email, String password) throws IOException, InterruptedException {
        HttpClient browser = HttpClient.newBuilder().cookieHandler(new CookieManager())
                .followRedirects(HttpClient.Redirect.NEVER).connectTimeout(Duration.ofSeconds(10)).build();
        String loginPage = send(browser, HttpRequest.newBuilder(base.resolve("/login")).GET(), 200).body();
        HttpResponse<String> signedIn = send(browser, form(base.resolve("/login"),
                Map.of("email", email, "password", password, "_csrf", csrf(loginPage, "/login"))), 302);
        String next = signedIn.headers().firstValue("Location").orElse("");
        if (next.contains("/login")) {
            throw new IllegalStateException("sign-in as " + email + " was refused (" + next + ")");
        }
        return browser;
    }

    /** Creates a token on the account page of a client signed in by {@link #signIn}. */
    public static String create(URI base, HttpClient browser, String label) throws IOException, InterruptedException {
        String accountPage = send(browser, HttpRequest.newBuilder(base.resolve("/account")).GET(), 200).body();
        String created = send(browser, form(base.resolve("/account/tokens"),
                Map.of("label", label, "_csrf", csrf(accountPage, "/account"))), 200).body();
        Matcher token = TOKEN.matcher(created);
        if (!token.find()) {
            throw new IllegalStateException("the account page showed no new API token");
        }
        return token.group(1);
    }

    private static String csrf(String page, String path) {
        Matcher m = CSRF.matcher(page);
        if (!m.find()) {
            throw new IllegalStateException(path + " has no CSRF token in its form");
        }
        return m.group(1);
    }

    private static HttpRequest.Builder form(URI uri, Map<String, String> fields) {
        String body = new LinkedHashMap<>(fields).entrySet().stream()
                .map(e -> URLEncoder.encode(e.getKey(), StandardCharsets.UTF_8) + "="
                        + URLEncoder.encode(e.getValue(), StandardCharsets.UTF_8))
                .collect(Collectors.joining("&"));
        return HttpRequest.newBuilder(uri).header("Content-Type", "application/x-www-form-urlencoded")
                .POST(HttpRequest.BodyPublishers.ofString(body));
    }

    private static HttpResponse<String> send(HttpClient client, HttpRequest.Builder request, int expected)
            throws IOException, InterruptedException {
        HttpResponse<String> r = client.send(request.timeout(Duration.ofSeconds(60)).build(),
                HttpResponse.BodyHandlers.ofString());
        if (r.statusCode() != expected) {
            throw new IllegalStateException(r.request().method() + " " + r.uri().getPath() + " answered "
                    + r.statusCode() + ", expected " + expected);
        }
        return r;
    }
}

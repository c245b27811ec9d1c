package org.lpzplanner.system;

import org.lpzplanner.accounts.SignedIn;
import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.net.CookieManager;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.lpzplanner.accounts.ApiTokenService;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.accounts.TestAccounts;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * Uploads over the size limit, through the real servlet container: the app answers 413 with the
 * limit, as JSON for the API and as a page for the forms, and stores nothing. The requests come
 * from outside the test's thread, so they carry an API token of the test's signed-in designer.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@SignedIn
class UploadLimitTest {

    @LocalServerPort
    int port;

    @Autowired
    SiteService sites;

    @Autowired
    ApiTokenService tokens;

    private static byte[] multipart(String boundary, int megabytes) throws Exception {
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        body.write(("--" + boundary + "\r\nContent-Disposition: form-data; name=\"file\"; filename=\"big.geojson\"\r\n"
                + "Content-Type: application/geo+json\r\n\r\n").getBytes(StandardCharsets.UTF_8));
        byte[] filler = new byte[megabytes * 1024 * 1024];
        Arrays.fill(filler, (byte) ' ');
        body.write(filler);
        body.write(("\r\n--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8));
        return body.toByteArray();
    }

    private HttpResponse<String> post(String path, int megabytes) throws Exception {
        String boundary = "lpz-limit";
        String token = tokens.create(CurrentAccount.signedIn().orElseThrow().accountId(), "upload limit test");
        return HttpClient.newHttpClient().send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + path))
                .header("Authorization", "Bearer " + token)
                .header("Content-Type", "multipart/form-data; boundary=" + boundary)
                .POST(HttpRequest.BodyPublishers.ofByteArray(multipart(boundary, megabytes))).build(),
                HttpResponse.BodyHandlers.ofString());
    }

    @ParameterizedTest
    @CsvSource({"/api/sites, 12", "/api/sites, 40", "/api/sites/import, 12"})
    void apiUploadOverTheLimitAnswers413WithTheLimit(String path, int megabytes) throws Exception {
        long before = sites.count();
        HttpResponse<String> r = post(path, megabytes);

        assertThat(r.statusCode()).isEqualTo(413);
        assertThat(r.headers().firstValue("Content-Type")).hasValueSatisfying(t -> assertThat(t).contains("json"));
        assertThat(r.body()).contains("\"field\":\"file\"", "larger than the upload limit of 10 MB",
                "nothing was stored");
        assertThat(sites.count()).isEqualTo(before);
    }

    /** The forms are pages: an API token is refused there before the body is read. */
    @ParameterizedTest
    @CsvSource({"/sites, 12", "/sites/import, 12"})
    void formUploadWithAnApiTokenIsRefusedAndStoresNothing(String path, int megabytes) throws Exception {
        long before = sites.count();
        HttpResponse<String> r = post(path, megabytes);

        assertThat(r.statusCode()).isEqualTo(403);
        assertThat(r.body()).contains("only for the JSON API under /api/");
        assertThat(sites.count()).isEqualTo(before);
    }

    /**
     * The upload form as a browser sends it: a session, and the form's token in a hidden field after
     * the file, so that it is read only with the oversized body.
     */
    @ParameterizedTest
    @CsvSource({"/sites, 12", "/sites/import, 12"})
    void browserFormUploadOverTheLimitShowsThePageWithTheLimit(String path, int megabytes) throws Exception {
        long before = sites.count();
        String email = CurrentAccount.signedIn().orElseThrow().email();
        HttpClient client = HttpClient.newBuilder().cookieHandler(new CookieManager())
                .followRedirects(HttpClient.Redirect.NORMAL).build();
        String base = "http://127.0.0.1:" + port;
        String login = client.send(HttpRequest.newBuilder(URI.create(base + "/login")).build(),
                HttpResponse.BodyHandlers.ofString()).body();
        String form = "_csrf=" + enc(hiddenToken(login)) + "&email=" + enc(email) + "&password="
                + enc(TestAccounts.PASSWORD);
        String list = client.send(HttpRequest.newBuilder(URI.create(base + "/login"))
                .header("Content-Type", "application/x-www-form-urlencoded")
                .POST(HttpRequest.BodyPublishers.ofString(form)).build(), HttpResponse.BodyHandlers.ofString()).body();
        Matcher action = Pattern.compile("action=\"(" + Pattern.quote(path) + ")\"").matcher(list);
        assertThat(action.find()).as("the site list's upload form posts to %s, with no token in the address", path)
                .isTrue();
        String boundary = "lpz-limit";
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        byte[] file = multipart(boundary, megabytes);
        // the file's part without the closing delimiter, then the token's part and the delimiter
        body.write(file, 0, file.length - ("\r\n--" + boundary + "--\r\n").length());
        body.write(("\r\n--" + boundary + "\r\nContent-Disposition: form-data; name=\"_csrf\"\r\n\r\n"
                + hiddenToken(list.substring(list.indexOf("action=\"" + path + "\""))) + "\r\n--" + boundary
                + "--\r\n").getBytes(StandardCharsets.UTF_8));
        HttpResponse<String> r = client.send(HttpRequest.newBuilder(URI.create(base + action.group(1)))
                .header("Accept", "text/html")
                .header("Content-Type", "multipart/form-data; boundary=" + boundary)
                .POST(HttpRequest.BodyPublishers.ofByteArray(body.toByteArray())).build(),
                HttpResponse.BodyHandlers.ofString());

        assertThat(r.statusCode()).isEqualTo(413);
        assertThat(r.body()).contains("id=\"upload-refused\"", "larger than the upload limit of 10 MB")
                .doesNotContain("Exception");
        assertThat(r.uri().toString()).doesNotContain("csrf");
        assertThat(sites.count()).isEqualTo(before);
    }

    private static String hiddenToken(String page) {
        Matcher m = Pattern.compile("name=\"_csrf\" value=\"([^\"]+)\"").matcher(page);
        assertThat(m.find()).as("sign-in form token").isTrue();
        return m.group(1);
    }

    private static String enc(String text) {
        return URLEncoder.encode(text, StandardCharsets.UTF_8);
    }
}

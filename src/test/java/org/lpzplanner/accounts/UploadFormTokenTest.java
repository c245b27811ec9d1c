package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * The site list's upload and import forms, as a browser sends them through the real servlet
 * container: the form token travels in a hidden field of the multipart body, never in an address
 * (addresses end up in logs, browser history and proxies), and an upload and an import still
 * succeed; without the field, or with a wrong one, the form is refused and nothing is stored.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@SignedIn
class UploadFormTokenTest {

    private static final Pattern URL_ATTRIBUTE = Pattern.compile("(?:action|href|src|formaction)=\"([^\"]*)\"");
    private static final String BOUNDARY = "lpz-form";

    @LocalServerPort
    int port;

    @Autowired
    SiteService sites;

    WebClient browser;

    @BeforeEach
    void signedInBrowser() throws Exception {
        browser = WebClient.signedIn(port, CurrentAccount.signedIn().orElseThrow().email());
    }

    /** A multipart body as a browser builds it from the form: the file first, the hidden token last. */
    private static byte[] multipart(String fileName, byte[] file, String token, String... fields) throws Exception {
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        body.write(("--" + BOUNDARY + "\r\nContent-Disposition: form-data; name=\"file\"; filename=\"" + fileName
                + "\"\r\nContent-Type: application/octet-stream\r\n\r\n").getBytes(StandardCharsets.UTF_8));
        body.write(file);
        for (int i = 0; i + 1 < fields.length; i += 2) {
            body.write(("\r\n--" + BOUNDARY + "\r\nContent-Disposition: form-data; name=\"" + fields[i] + "\"\r\n\r\n"
                    + fields[i + 1]).getBytes(StandardCharsets.UTF_8));
        }
        if (token != null) {
            body.write(("\r\n--" + BOUNDARY + "\r\nContent-Disposition: form-data; name=\"_csrf\"\r\n\r\n" + token)
                    .getBytes(StandardCharsets.UTF_8));
        }
        body.write(("\r\n--" + BOUNDARY + "--\r\n").getBytes(StandardCharsets.UTF_8));
        return body.toByteArray();
    }

    private HttpResponse<String> postForm(String action, byte[] body) throws Exception {
        return browser.send(HttpRequest.newBuilder(browser.uri(action)).header("Accept", "text/html")
                .header("Content-Type", "multipart/form-data; boundary=" + BOUNDARY)
                .POST(HttpRequest.BodyPublishers.ofByteArray(body)));
    }

    /** The form's action and the value of its hidden token. */
    private static String[] form(String page, String id) {
        Matcher form = Pattern.compile("<form[^>]*" + id + "[^>]*>(.*?)</form>", Pattern.DOTALL).matcher(page);
        assertThat(form.find()).as("form %s on the site list", id).isTrue();
        Matcher action = Pattern.compile("action=\"([^\"]*)\"").matcher(form.group());
        assertThat(action.find()).isTrue();
        return new String[] {action.group(1), WebClient.hiddenToken(form.group())};
    }

    @Test
    void noAddressOnTheSiteListCarriesTheFormToken() throws Exception {
        String page = browser.get("/").body();
        Matcher urls = URL_ATTRIBUTE.matcher(page);
        int found = 0;
        while (urls.find()) {
            found++;
            assertThat(urls.group(1)).as("an address on the site list").doesNotContain("_csrf", "csrf");
        }
        assertThat(found).isGreaterThan(5);
        assertThat(form(page, "id=\"upload-form\"")[0]).isEqualTo("/sites");
        assertThat(form(page, "id=\"import-form\"")[0]).isEqualTo("/sites/import");
    }

    @Test
    void anUploadAndAnImportThroughTheFormsSucceedWithTheTokenInTheBody() throws Exception {
        String[] upload = form(browser.get("/").body(), "id=\"upload-form\"");
        byte[] hall = Files.readAllBytes(Path.of("sample-sites", "millbrook-hall.geojson"));
        HttpResponse<String> uploaded = postForm(upload[0], multipart("hall.geojson", hall, upload[1],
                "name", "Hall through the form", "level", "II"));

        assertThat(uploaded.statusCode()).as(uploaded.body()).isEqualTo(302);
        String plan = WebClient.location(uploaded);
        assertThat(plan).matches("/sites/\\d+").doesNotContain("csrf");
        assertThat(browser.get(plan).body()).contains("Hall through the form");

        byte[] export = browser.send(HttpRequest.newBuilder(browser.uri("/api" + plan + "/export")).GET()).body()
                .getBytes(StandardCharsets.UTF_8);
        String[] importForm = form(browser.get("/").body(), "id=\"import-form\"");
        HttpResponse<String> imported = postForm(importForm[0], multipart("hall.site-export.json", export,
                importForm[1]));

        assertThat(imported.statusCode()).as(imported.body()).isEqualTo(302);
        String copy = WebClient.location(imported);
        assertThat(copy).matches("/sites/\\d+").isNotEqualTo(plan).doesNotContain("csrf");
        assertThat(browser.get(copy).body()).contains("Hall through the form");
    }

    @Test
    void theFormsWithoutTheirTokenOrWithAWrongOneStoreNothing() throws Exception {
        long before = sites.count();
        byte[] hall = Files.readAllBytes(Path.of("sample-sites", "millbrook-hall.geojson"));
        for (String action : new String[] {"/sites", "/sites/import"}) {
            assertThat(postForm(action, multipart("hall.geojson", hall, null)).statusCode()).as(action).isEqualTo(403);
            assertThat(postForm(action, multipart("hall.geojson", hall, "not-the-token")).statusCode()).as(action)
                    .isEqualTo(403);
        }
        assertThat(sites.count()).isEqualTo(before);
    }
}

package org.lpzplanner.persistence;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lpzplanner.LpzPlannerApplication;
import org.lpzplanner.accounts.Account;
import org.lpzplanner.accounts.AccountService;
import org.lpzplanner.accounts.ApiTokenService;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.accounts.Role;
import org.lpzplanner.jobs.JobInstance;
import org.lpzplanner.jobs.JobStore;
import org.lpzplanner.sites.SiteService;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.boot.web.server.context.WebServerApplicationContext;
import org.springframework.context.ConfigurableApplicationContext;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Several app instances on one database, as behind a proxy that sends each request wherever it
 * likes: a background analysis or proposal started through one instance is followed, cancelled,
 * accepted and taken back through another (over HTTP, with an API token), also after the instance
 * that ran it restarted; another team's token finds none of it; and a job whose instance died
 * reads as interrupted instead of running for ever. The instances share an H2 file database here
 * (AUTO_SERVER); {@link JobsAcrossInstancesOnPostgresTest} runs the same on PostgreSQL.
 */
class JobsAcrossInstancesTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final String PASSWORD = "correct horse battery staple";

    @TempDir
    Path folder;

    private final HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
    private final List<ConfigurableApplicationContext> started = new ArrayList<>();
    private String url;

    /** The JDBC URL, user and password of the shared database. */
    protected String[] database(Path folder) {
        return new String[] {"jdbc:h2:file:" + folder.resolve("shared").toAbsolutePath() + ";AUTO_SERVER=TRUE", "sa", ""};
    }

    private String[] db;

    @BeforeEach
    void database() {
        db = database(folder);
    }

    @AfterEach
    void stopInstances() {
        started.forEach(ConfigurableApplicationContext::close);
    }

    private ConfigurableApplicationContext instance(String name) {
        ConfigurableApplicationContext context = new SpringApplicationBuilder(LpzPlannerApplication.class).run(
                "--spring.datasource.url=" + db[0], "--spring.datasource.username=" + db[1],
                "--spring.datasource.password=" + db[2], "--server.port=0", "--lpz.instance.name=" + name,
                "--lpz.demo-data=false", "--lpz.data-dir=" + folder.resolve("data"), "--lpz.jobs.heartbeat=PT0.2S",
                "--lpz.jobs.stale-after=PT3S", "--lpz.analysis.workers=1", "--lpz.analysis.queue=2",
                "--spring.main.banner-mode=off");
        started.add(context);
        return context;
    }

    private static String base(ConfigurableApplicationContext context) {
        return "http://127.0.0.1:" + ((WebServerApplicationContext) context).getWebServer().getPort();
    }

    /** A token of a new designer of the team (created when missing). */
    private static String token(ConfigurableApplicationContext context, String email, String team) {
        AccountService accounts = context.getBean(AccountService.class);
        long teamId = accounts.teams().stream().filter(t -> t.name().equals(team)).findFirst()
                .orElseGet(() -> accounts.createTeam(team)).id();
        Account account = accounts.create(email, "Designer " + email, PASSWORD, Role.DESIGNER, teamId);
        return context.getBean(ApiTokenService.class).create(account.id(), "test");
    }

    private record Answer(int status, JsonNode body) {
    }

    private Answer send(String method, String address, String token, String json) throws Exception {
        HttpRequest.Builder request = HttpRequest.newBuilder(URI.create(address)).timeout(Duration.ofSeconds(60))
                .header("Authorization", "Bearer " + token).header("Accept", "application/json");
        if (json != null) {
            request.header("Content-Type", "application/json").method(method, HttpRequest.BodyPublishers.ofString(json));
        } else {
            request.method(method, HttpRequest.BodyPublishers.noBody());
        }
        HttpResponse<String> response = http.send(request.build(), HttpResponse.BodyHandlers.ofString());
        String body = response.body();
        return new Answer(response.statusCode(), body == null || body.isBlank() ? null : JSON.readTree(body));
    }

    private JsonNode until(String address, String token, Predicate<JsonNode> done) throws Exception {
        JsonNode now = null;
        for (int i = 0; i < 1200; i++) {
            Answer answer = send("GET", address, token, null);
            assertThat(answer.status()).as(address).isEqualTo(200);
            now = answer.body();
            if (done.test(now)) {
                return now;
            }
            Thread.sleep(100);
        }
        return now;
    }

    @Test
    void jobsStartedOnOneInstanceAreFollowedCancelledAcceptedAndUndoneOnAnother() throws Exception {
        ConfigurableApplicationContext a = instance("instance-a");
        ConfigurableApplicationContext b = instance("instance-b");
        String token = token(a, "designer@jobs.example", "Harbour office");
        String stranger = token(b, "designer@elsewhere.example", "Inland office");
        long team = a.getBean(AccountService.class).teams().stream().filter(t -> t.name().equals("Harbour office"))
                .findFirst().orElseThrow().id();
        byte[] campus = Files.readAllBytes(Path.of("sample-sites", "brookfield-campus.geojson"));
        // a small flat-roofed shed (invented), quick to analyse and to propose for
        byte[] yard = """
                {"type": "FeatureCollection", "name": "Yard", "coordinates": "local-metres", "features": [
                  {"type": "Feature", "properties": {"kind": "structure", "name": "Yard shed", "height": 6},
                   "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [12, 0], [12, 8], [0, 8], [0, 0]]]}}
                ]}""".getBytes(java.nio.charset.StandardCharsets.UTF_8);
        SiteService sitesOfA = a.getBean(SiteService.class);
        long campusId = CurrentAccount.asSystem("test", team,
                () -> sitesOfA.create("campus.geojson", campus, "Campus", "I", null).id());
        long yardId = CurrentAccount.asSystem("test", team,
                () -> sitesOfA.create("yard.geojson", yard, "Yard", "III", null).id());

        // an analysis queued on A is followed on B to its stored revision
        Answer queued = send("POST", base(a) + "/api/sites/" + yardId + "/analyses?async=true&level=I", token, null);
        assertThat(queued.status()).isEqualTo(202);
        String analysisPath = "/api/sites/" + yardId + "/analyses/jobs/" + queued.body().path("id").asString();
        JsonNode done = until(base(b) + analysisPath, token, j -> !j.path("state").asString().matches("QUEUED|RUNNING"));
        assertThat(done.path("state").asString()).isEqualTo("DONE");
        assertThat(done.path("revision").asInt()).isEqualTo(1);
        assertThat(send("GET", base(b) + "/api/sites/" + yardId + "/analyses/latest", token, null).body()
                .path("summary").path("revision").asInt()).isEqualTo(1);
        assertThat(send("GET", base(b) + analysisPath, stranger, null).status()).isEqualTo(404);

        // a long analysis runs on A (one worker), a second waits in A's queue: B cancels both
        String slow = send("POST", base(a) + "/api/sites/" + campusId + "/analyses?async=true&level=I&resolution=0.25",
                token, null).body().path("id").asString();
        String waiting = send("POST", base(a) + "/api/sites/" + campusId + "/analyses?async=true&level=I", token, null)
                .body().path("id").asString();
        String jobs = "/api/sites/" + campusId + "/analyses/jobs/";
        assertThat(until(base(b) + jobs + slow, token, j -> j.path("state").asString().equals("RUNNING"))
                .path("state").asString()).isEqualTo("RUNNING");
        assertThat(send("DELETE", base(b) + jobs + waiting, stranger, null).status()).isEqualTo(404);
        assertThat(send("DELETE", base(b) + jobs + waiting, token, null).body().path("state").asString())
                .as("a queued job cancelled through another instance never starts").isEqualTo("CANCELLED");
        assertThat(send("DELETE", base(b) + jobs + slow, token, null).status()).isEqualTo(200);
        JsonNode stopped = until(base(b) + jobs + slow, token, j -> !j.path("state").asString().equals("RUNNING"));
        assertThat(stopped.path("state").asString()).isEqualTo("CANCELLED");
        assertThat(stopped.path("revision").isNull() || stopped.path("revision").isMissingNode()).isTrue();
        assertThat(send("GET", base(a) + jobs + waiting, token, null).body().path("state").asString())
                .isEqualTo("CANCELLED");

        // a proposal computed on A is read on B; A restarts; B accepts it and the restarted A takes it back
        long version = CurrentAccount.asSystem("test", team, () -> sitesOfA.get(yardId).version());
        Answer proposal = send("POST", base(a) + "/api/sites/" + yardId + "/proposals", token,
                "{\"rodHeights\": [0.5, 1, 2]}");
        assertThat(proposal.status()).isEqualTo(202);
        String proposalPath = "/api/sites/" + yardId + "/proposals/" + proposal.body().path("jobId").asString();
        JsonNode proposed = until(base(b) + proposalPath, token, j -> !j.path("state").asString().equals("running"));
        assertThat(proposed.path("state").asString()).isEqualTo("done");
        assertThat(proposed.path("count").asInt()).isPositive().isEqualTo(proposed.path("parts").size());
        assertThat(proposed.path("cautions").size()).isPositive();
        assertThat(send("GET", base(b) + proposalPath, stranger, null).status()).isEqualTo(404);

        a.close();
        ConfigurableApplicationContext restarted = instance("instance-a");
        JsonNode accepted = send("POST", base(b) + proposalPath + "/accept", token, "{\"version\": " + version + "}")
                .body();
        assertThat(accepted.path("rodIds").size()).isEqualTo(proposed.path("count").asInt());
        long acceptedVersion = accepted.path("version").asLong();
        SiteService sitesOfB = b.getBean(SiteService.class);
        assertThat(CurrentAccount.asSystem("test", team, () -> sitesOfB.document(sitesOfB.get(yardId)).site().rods()))
                .hasSize(proposed.path("count").asInt());
        Answer undone = send("POST", base(restarted) + proposalPath + "/undo", token,
                "{\"version\": " + acceptedVersion + "}");
        assertThat(undone.status()).isEqualTo(200);
        assertThat(CurrentAccount.asSystem("test", team, () -> sitesOfB.document(sitesOfB.get(yardId)).site().rods()))
                .isEmpty();
        // taken back once only, whichever instance is asked again
        assertThat(send("POST", base(b) + proposalPath + "/undo", token,
                "{\"version\": " + undone.body().path("version").asLong() + "}").status()).isEqualTo(400);
    }

    @Test
    void aJobOfADeadInstanceReadsAsInterrupted() throws Exception {
        ConfigurableApplicationContext b = instance("instance-b");
        String token = token(b, "designer@jobs.example", "Harbour office");
        long team = b.getBean(AccountService.class).teams().stream().filter(t -> t.name().equals("Harbour office"))
                .findFirst().orElseThrow().id();
        byte[] harbour = Files.readAllBytes(Path.of("sample-sites", "harbour-warehouse.geojson"));
        SiteService sites = b.getBean(SiteService.class);
        long id = CurrentAccount.asSystem("test", team, () -> sites.create("harbour.geojson", harbour, "Harbour", "III",
                null).id());
        JobStore store = b.getBean(JobStore.class);
        Instant now = Instant.now();

        // an instance that died a minute ago in the middle of an analysis
        store.insert(new JobStore.NewJob("dead-1", JobStore.ANALYSIS, id, team, "designer@jobs.example",
                JobStore.RUNNING, null, null, null, "instance-gone"), now.minusSeconds(60));
        JsonNode job = send("GET", base(b) + "/api/sites/" + id + "/analyses/jobs/dead-1", token, null).body();
        assertThat(job.path("state").asString()).isEqualTo("FAILED");
        assertThat(job.path("error").asString()).isEqualTo(JobInstance.INTERRUPTED);

        // an instance that stopped with a proposal running and now starts again under its name
        store.insert(new JobStore.NewJob("dead-2", JobStore.PROPOSAL, id, team, "designer@jobs.example",
                JobStore.RUNNING, "choosing", 0L, "{\"level\": \"III\", \"radius\": 45}", "instance-c"), now);
        assertThat(send("GET", base(b) + "/api/sites/" + id + "/proposals/dead-2", token, null).body()
                .path("state").asString()).as("its heartbeat is still fresh").isEqualTo("running");
        instance("instance-c");
        JsonNode proposal = send("GET", base(b) + "/api/sites/" + id + "/proposals/dead-2", token, null).body();
        assertThat(proposal.path("state").asString()).isEqualTo("failed");
        assertThat(proposal.path("error").asString()).isEqualTo(JobInstance.INTERRUPTED);
    }
}

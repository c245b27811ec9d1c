package org.lpzplanner.persistence;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lpzplanner.sites.SiteFiles;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Durability of the file database: the app runs in its own JVM while clients keep saving (moving a
 * rod, which rewrites the site file, keeps the earlier file and stores a new analysis revision; and
 * plain analyses). The JVM is killed with SIGKILL in the middle of this, twice, and restarted. Every
 * save a client was told succeeded must be there, whole, and no save may be there in part. The
 * clients send an API token of the administrator the app creates at its first start.
 */
class KillDuringSavesTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final long SEED = Long.getLong("lpz.seed", 20_260_501L);
    private static final String SITE = """
            {"type": "FeatureCollection", "name": "Kiln yard", "coordinates": "local-metres", "features": [
              {"type": "Feature", "properties": {"kind": "structure", "name": "Kiln shed", "height": 6, "roof": "flat"},
               "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [12, 0], [12, 8], [0, 8], [0, 0]]]}},
              {"type": "Feature", "id": "r1", "properties": {"kind": "rod", "name": "Yard rod", "height": 3},
               "geometry": {"type": "Point", "coordinates": [20, 4]}}
            ]}
            """;

    private final HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();

    /** What clients were told for one site: the latest acknowledged version, rod position and revisions. */
    private static final class Track {
        final long id;
        volatile long version;
        volatile double rodX = 20;
        volatile int step;
        final Set<Integer> revisions = java.util.concurrent.ConcurrentHashMap.newKeySet();

        Track(long id) {
            this.id = id;
        }
    }

    @Test
    void sigkillDuringSavesLosesNoCommittedRevisionAndLeavesNoneHalfWritten(@TempDir Path dataDir) throws Exception {
        Path log = Files.createDirectories(Path.of("target", "durability")).resolve("app.log");
        Files.deleteIfExists(log);
        Random random = new Random(SEED);
        List<Track> tracks = new ArrayList<>();
        AppProcess app = AppProcess.start(dataDir, log);
        for (int i = 0; i < 2; i++) {
            JsonNode uploaded = upload(app, "kiln-yard-" + i + ".geojson");
            Track track = new Track(uploaded.path("id").asLong());
            // an upload is analysed at once, which counts the version up
            track.version = uploaded.path("version").asLong();
            tracks.add(track);
        }
        for (int round = 0; round < 2; round++) {
            AtomicInteger acknowledged = new AtomicInteger();
            List<Thread> clients = new ArrayList<>();
            for (Track track : tracks) {
                AppProcess target = app;
                Thread client = new Thread(() -> saveUntilRefused(target, track, acknowledged), "client-" + track.id);
                client.start();
                clients.add(client);
            }
            int killAfter = 8 + random.nextInt(10);
            long deadline = System.nanoTime() + Duration.ofSeconds(90).toNanos();
            while (acknowledged.get() < killAfter && System.nanoTime() < deadline) {
                Thread.sleep(20);
            }
            Thread.sleep(random.nextInt(30));
            app.kill();
            for (Thread client : clients) {
                client.join(30_000);
            }
            assertThat(failures).as("answers to saves before the kill").isEmpty();
            assertThat(acknowledged.get()).as("saves acknowledged before the kill").isGreaterThanOrEqualTo(killAfter);

            app = AppProcess.start(dataDir, log);
            for (Track track : tracks) {
                JsonNode site = get(app, "/api/sites/" + track.id);
                assertThat(site.path("version").asLong()).as("site version after restart")
                        .isGreaterThanOrEqualTo(track.version);
                track.version = site.path("version").asLong();
                double x = get(app, "/api/sites/" + track.id + "/parts").path("rods").get(0).path("x").asDouble();
                assertThat(x).as("rod position after restart").isGreaterThanOrEqualTo(track.rodX - 1e-9);
                track.rodX = x;
                track.step = (int) Math.round((x - 20) / 0.05);
            }
        }
        app.close();

        try (Connection db = DriverManager.getConnection("jdbc:h2:file:" + dataDir.resolve("lpz-planner").toAbsolutePath(),
                "sa", "")) {
            for (Track track : tracks) {
                checkWhole(db, track);
            }
        }
    }

    /** Moves the site's rod east step by step (each move is also analysed), with a plain analysis now and then. */
    private final List<Throwable> failures = java.util.Collections.synchronizedList(new ArrayList<>());

    private void saveUntilRefused(AppProcess app, Track track, AtomicInteger acknowledged) {
        try {
            while (true) {
                int step = track.step + 1;
                double x = 20 + step * 0.05;
                String body = "{\"version\": " + track.version + ", \"x\": " + x + ", \"y\": 4, \"height\": \"3\"}";
                HttpResponse<String> moved = http.send(app.request("/api/sites/" + track.id + "/rods/r1")
                        .header("Content-Type", "application/json").PUT(HttpRequest.BodyPublishers.ofString(body))
                        .timeout(Duration.ofSeconds(60)).build(), HttpResponse.BodyHandlers.ofString());
                assertThat(moved.statusCode()).as(moved.body()).isEqualTo(200);
                JsonNode answer = JSON.readTree(moved.body());
                track.step = step;
                track.rodX = x;
                track.version = answer.path("version").asLong();
                track.revisions.add(answer.path("summary").path("revision").asInt());
                acknowledged.incrementAndGet();
                if (step % 3 == 0) {
                    HttpResponse<String> analysed = http.send(app.request(
                                    "/api/sites/" + track.id + "/analyses?resolution=0.5")
                            .POST(HttpRequest.BodyPublishers.noBody()).timeout(Duration.ofSeconds(60)).build(),
                            HttpResponse.BodyHandlers.ofString());
                    assertThat(analysed.statusCode()).as(analysed.body()).isEqualTo(201);
                    track.revisions.add(JSON.readTree(analysed.body()).path("summary").path("revision").asInt());
                    track.version = track.version + 1;
                    acknowledged.incrementAndGet();
                }
            }
        } catch (IOException | InterruptedException killed) {
            // the server went away: expected once it is killed
        } catch (Throwable e) {
            failures.add(e);
        }
    }

    /** Every acknowledged revision is there with its whole result, and every change is whole. */
    private static void checkWhole(Connection db, Track track) throws Exception {
        Set<String> fileHashes = new HashSet<>();
        String current;
        try (PreparedStatement s = db.prepareStatement("SELECT source_text, source_name, version FROM sites WHERE id = ?")) {
            s.setLong(1, track.id);
            ResultSet rs = s.executeQuery();
            assertThat(rs.next()).isTrue();
            current = rs.getString(1);
            SiteFiles.read(current, rs.getString(2));
            fileHashes.add(sha256(current));
            assertThat(rs.getLong(3)).isEqualTo(track.version);
        }
        int earlierFiles = 0;
        try (PreparedStatement s = db.prepareStatement(
                "SELECT file_number, source_text FROM site_file_versions WHERE site_id = ? ORDER BY file_number")) {
            s.setLong(1, track.id);
            ResultSet rs = s.executeQuery();
            while (rs.next()) {
                earlierFiles++;
                assertThat(rs.getInt(1)).as("earlier files numbered without gaps").isEqualTo(earlierFiles);
                fileHashes.add(sha256(rs.getString(2)));
            }
        }
        Set<Integer> revisions = new HashSet<>();
        try (PreparedStatement s = db.prepareStatement(
                "SELECT revision, inputs_sha256, result_geojson FROM analysis_revisions WHERE site_id = ? ORDER BY revision")) {
            s.setLong(1, track.id);
            ResultSet rs = s.executeQuery();
            while (rs.next()) {
                revisions.add(rs.getInt(1));
                assertThat(rs.getInt(1)).as("revisions numbered without gaps").isEqualTo(revisions.size());
                assertThat(fileHashes).as("revision %d read a file the site had", rs.getInt(1)).contains(rs.getString(2));
                assertThat(JSON.readTree(rs.getString(3)).path("type").asString()).isEqualTo("FeatureCollection");
            }
        }
        assertThat(revisions).as("every acknowledged revision").containsAll(track.revisions);
        // each rod move replaces the file and keeps the earlier one in one transaction, each analysis
        // stores a revision and counts the version up in one: a half-done save breaks this sum
        assertThat(track.version).as("version = file replacements + analyses")
                .isEqualTo(earlierFiles + (long) revisions.size());
    }

    private JsonNode upload(AppProcess app, String fileName) throws Exception {
        String boundary = "lpz" + System.nanoTime();
        String body = "--" + boundary + "\r\nContent-Disposition: form-data; name=\"file\"; filename=\"" + fileName
                + "\"\r\nContent-Type: application/geo+json\r\n\r\n" + SITE + "\r\n--" + boundary + "--\r\n";
        HttpResponse<String> r = http.send(app.request("/api/sites")
                .header("Content-Type", "multipart/form-data; boundary=" + boundary)
                .POST(HttpRequest.BodyPublishers.ofString(body, StandardCharsets.UTF_8)).build(),
                HttpResponse.BodyHandlers.ofString());
        assertThat(r.statusCode()).as(r.body()).isEqualTo(201);
        return JSON.readTree(r.body());
    }

    private JsonNode get(AppProcess app, String path) throws Exception {
        HttpResponse<String> r = http.send(app.request(path).build(),
                HttpResponse.BodyHandlers.ofString());
        assertThat(r.statusCode()).as(path + ": " + r.body()).isEqualTo(200);
        return JSON.readTree(r.body());
    }

    private static String sha256(String text) throws Exception {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8)));
    }
}

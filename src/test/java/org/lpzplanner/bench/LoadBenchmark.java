package org.lpzplanner.bench;

import java.io.IOException;
import java.net.InetAddress;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Load on a running app, from this machine only: simulated users each own a site (a small yard
 * with two structures and one rod) and loop through viewing its plan page, analysing it and moving the
 * rod (which rewrites the file and analyses again). Bounded by time and by a request count. Prints
 * throughput, p50/p99 latency per step, the answers by status, and the server's peak resident memory
 * when its process id is given.
 *
 * <pre>scripts/load [--url http://127.0.0.1:8080] [--users 50] [--seconds 60] [--max-requests 100000] [--pid N]
 *             (--token lpz_… | --email E [--password P])</pre>
 *
 * Every API request carries {@code Authorization: Bearer} with a designer's or administrator's API
 * token: given with {@code --token} (or {@code LPZ_API_TOKEN}), or created by signing in with
 * {@code --email} and the password ({@code --password} or {@code LPZ_LOAD_PASSWORD}). API tokens do
 * not open pages, so the plan page is viewed with the session of that sign-in; with a token alone
 * the view step is left out.
 */
public final class LoadBenchmark {

    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final String[] STEPS = {"view", "analyse", "move-rod"};

    private final URI base;
    private final HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(10)).build();
    private final Map<String, List<Long>> latencies = new ConcurrentHashMap<>();
    private final Map<String, AtomicLong> statuses = new ConcurrentHashMap<>();
    private final AtomicLong requests = new AtomicLong();

    private final String token;
    /** Signed in on the sign-in page (pages need a session), or null when only a token was given. */
    private final HttpClient pages;

    private LoadBenchmark(URI base, String token, HttpClient pages) {
        this.base = base;
        this.token = token;
        this.pages = pages;
        for (String step : STEPS) {
            latencies.put(step, java.util.Collections.synchronizedList(new ArrayList<>()));
        }
    }

    public static void main(String[] args) throws Exception {
        Map<String, String> options = new TreeMap<>(Map.of("url", "http://127.0.0.1:8080", "users", "50",
                "seconds", "60", "max-requests", "100000", "pid", ""));
        options.put("token", System.getenv().getOrDefault("LPZ_API_TOKEN", ""));
        options.put("email", "");
        options.put("password", System.getenv().getOrDefault("LPZ_LOAD_PASSWORD", ""));
        for (int i = 0; i + 1 < args.length; i += 2) {
            options.put(args[i].replaceFirst("^--", ""), args[i + 1]);
        }
        URI base = URI.create(options.get("url"));
        if (!InetAddress.getByName(base.getHost()).isLoopbackAddress()) {
            throw new IllegalArgumentException("the load script runs against this machine only, not " + base.getHost());
        }
        int users = Integer.parseInt(options.get("users"));
        int seconds = Math.min(600, Integer.parseInt(options.get("seconds")));
        long maxRequests = Long.parseLong(options.get("max-requests"));
        String token = options.get("token");
        HttpClient pages = null;
        if (!options.get("email").isBlank()) {
            pages = ApiTokenOverHttp.signIn(base, options.get("email"), options.get("password"));
        } else {
            System.out.println("No --email: the view step (a page, which needs a signed-in session) is left out.");
        }
        if (token.isBlank()) {
            if (pages == null) {
                throw new IllegalArgumentException("give --token lpz_… (or LPZ_API_TOKEN), or --email and the password"
                        + " (--password or LPZ_LOAD_PASSWORD) of a designer or administrator");
            }
            token = ApiTokenOverHttp.create(base, pages, "load script");
        }
        new LoadBenchmark(base, token, pages).run(users, seconds, maxRequests, options.get("pid"));
    }

    private void run(int users, int seconds, long maxRequests, String pid) throws Exception {
        String site = siteWithRod();
        List<Long> sites = new ArrayList<>();
        for (int u = 0; u < users; u++) {
            sites.add(upload(site, "Load yard " + (u + 1)));
        }
        long start = System.nanoTime();
        long end = start + TimeUnit.SECONDS.toNanos(seconds);
        ExecutorService pool = Executors.newFixedThreadPool(users);
        for (long siteId : sites) {
            pool.submit(() -> user(siteId, end, maxRequests));
        }
        pool.shutdown();
        pool.awaitTermination(seconds + 120L, TimeUnit.SECONDS);
        double elapsed = (System.nanoTime() - start) / 1e9;
        for (long siteId : sites) {
            send(HttpRequest.newBuilder(base.resolve("/api/sites/" + siteId)).DELETE(), null);
        }
        report(users, elapsed, pid);
    }

    /** One user: view, analyse, move the rod, until the time or the request budget is spent. */
    private void user(long siteId, long end, long maxRequests) {
        long version = -1;
        double x = 25;
        try {
            while (System.nanoTime() < end && requests.get() < maxRequests) {
                if (pages != null) {
                    viewPage(siteId);
                }
                HttpResponse<String> analysed = timed("analyse",
                        HttpRequest.newBuilder(base.resolve("/api/sites/" + siteId + "/analyses")).POST(
                                HttpRequest.BodyPublishers.noBody()));
                if (version < 0 || analysed.statusCode() == 201) {
                    version = JSON.readTree(send(HttpRequest.newBuilder(base.resolve("/api/sites/" + siteId)).GET(),
                            null).body()).path("version").asLong();
                }
                x = x >= 35 ? 25 : x + 0.5;
                String body = "{\"version\": " + version + ", \"x\": " + x + ", \"y\": 6, \"height\": \"4\"}";
                HttpResponse<String> moved = timed("move-rod",
                        HttpRequest.newBuilder(base.resolve("/api/sites/" + siteId + "/rods/load-rod"))
                                .header("Content-Type", "application/json")
                                .PUT(HttpRequest.BodyPublishers.ofString(body)));
                JsonNode answer = moved.statusCode() == 200 ? JSON.readTree(moved.body()) : null;
                version = answer == null ? -1 : answer.path("version").asLong();
            }
        } catch (Exception e) {
            statuses.computeIfAbsent("client error: " + e.getClass().getSimpleName(), k -> new AtomicLong())
                    .incrementAndGet();
        }
    }

    /** The plan page, with the session of the sign-in (a token is refused on pages). */
    private void viewPage(long siteId) throws IOException, InterruptedException {
        long t0 = System.nanoTime();
        HttpResponse<String> response = pages.send(HttpRequest.newBuilder(base.resolve("/sites/" + siteId))
                .timeout(Duration.ofSeconds(120)).GET().build(), HttpResponse.BodyHandlers.ofString());
        latencies.get("view").add(System.nanoTime() - t0);
        requests.incrementAndGet();
        statuses.computeIfAbsent("view " + response.statusCode(), k -> new AtomicLong()).incrementAndGet();
    }

    private HttpResponse<String> timed(String step, HttpRequest.Builder request) throws IOException, InterruptedException {
        long t0 = System.nanoTime();
        HttpResponse<String> response = send(request, step);
        latencies.get(step).add(System.nanoTime() - t0);
        requests.incrementAndGet();
        return response;
    }

    private HttpResponse<String> send(HttpRequest.Builder request, String step) throws IOException, InterruptedException {
        HttpResponse<String> response = http.send(request.header("Authorization", "Bearer " + token)
                        .timeout(Duration.ofSeconds(120)).build(),
                HttpResponse.BodyHandlers.ofString());
        if (step != null) {
            statuses.computeIfAbsent(step + " " + response.statusCode(), k -> new AtomicLong()).incrementAndGet();
        }
        return response;
    }

    private long upload(String site, String name) throws Exception {
        String boundary = "lpz-load";
        String body = "--" + boundary + "\r\nContent-Disposition: form-data; name=\"name\"\r\n\r\n" + name + "\r\n--"
                + boundary + "\r\nContent-Disposition: form-data; name=\"file\"; filename=\"load-yard.geojson\"\r\n"
                + "Content-Type: application/geo+json\r\n\r\n" + site + "\r\n--" + boundary + "--\r\n";
        HttpResponse<String> r = send(HttpRequest.newBuilder(base.resolve("/api/sites"))
                .header("Content-Type", "multipart/form-data; boundary=" + boundary)
                .POST(HttpRequest.BodyPublishers.ofString(body, StandardCharsets.UTF_8)), null);
        if (r.statusCode() != 201) {
            throw new IllegalStateException("upload refused: " + r.statusCode() + " " + r.body());
        }
        return JSON.readTree(r.body()).path("id").asLong();
    }

    /** A small yard: a hall, a store and one rod between them (invented). */
    private static String siteWithRod() {
        return """
                {"type": "FeatureCollection", "name": "Load yard", "coordinates": "local-metres", "features": [
                  {"type": "Feature", "properties": {"kind": "structure", "name": "Hall", "height": 8, "roof": "flat"},
                   "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [20, 0], [20, 12], [0, 12], [0, 0]]]}},
                  {"type": "Feature", "properties": {"kind": "structure", "name": "Store", "height": 5, "roof": "flat"},
                   "geometry": {"type": "Polygon", "coordinates": [[[40, 0], [50, 0], [50, 8], [40, 8], [40, 0]]]}},
                  {"type": "Feature", "id": "load-rod", "properties": {"kind": "rod", "name": "Yard rod", "height": 4},
                   "geometry": {"type": "Point", "coordinates": [30, 6]}}
                ]}
                """;
    }

    private void report(int users, double elapsed, String pid) throws IOException {
        long total = requests.get();
        System.out.printf(Locale.ROOT, "| users | seconds | requests | throughput (req/s) |%n|---|---|---|---|%n"
                + "| %d | %.1f | %d | %.1f |%n%n", users, elapsed, total, total / elapsed);
        System.out.println("| step | count | p50 (ms) | p99 (ms) | max (ms) |");
        System.out.println("|---|---|---|---|---|");
        for (String step : STEPS) {
            long[] nanos = latencies.get(step).stream().mapToLong(Long::longValue).sorted().toArray();
            if (nanos.length == 0) {
                continue;
            }
            System.out.printf(Locale.ROOT, "| %s | %d | %.0f | %.0f | %.0f |%n", step, nanos.length,
                    percentile(nanos, 0.50) / 1e6, percentile(nanos, 0.99) / 1e6, nanos[nanos.length - 1] / 1e6);
        }
        System.out.println();
        System.out.println("Answers: " + new TreeMap<>(statuses));
        if (pid != null && !pid.isBlank()) {
            for (String line : Files.readAllLines(Path.of("/proc", pid.strip(), "status"))) {
                if (line.startsWith("VmHWM") || line.startsWith("VmRSS")) {
                    System.out.println("Server " + line.replaceAll("\\s+", " "));
                }
            }
        }
    }

    private static double percentile(long[] sorted, double p) {
        int index = (int) Math.ceil(p * sorted.length) - 1;
        return sorted[Math.max(0, Math.min(sorted.length - 1, index))];
    }

}

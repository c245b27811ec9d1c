package org.lpzplanner.persistence;

import java.io.File;
import java.io.IOException;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;
import org.lpzplanner.bench.ApiTokenOverHttp;

/**
 * The app in a JVM of its own, on the data folder given, with the main configuration (the test
 * classes and their in-memory settings are left off the class path). {@link #kill()} sends SIGKILL.
 * The first start creates an administrator from the environment (as an unattended install does);
 * every start signs in as them and keeps a fresh API token for the requests, see {@link #request}.
 */
final class AppProcess implements AutoCloseable {

    static final String ADMIN_EMAIL = "durability@kiln-yard.test";
    static final String ADMIN_PASSWORD = "kiln-yard-durability";

    private final Process process;
    final int port;
    private String token;

    private AppProcess(Process process, int port) {
        this.process = process;
        this.port = port;
    }

    static AppProcess start(Path dataDir, Path log) throws Exception {
        int port;
        try (ServerSocket socket = new ServerSocket(0)) {
            port = socket.getLocalPort();
        }
        String classPath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        String mainOnly = Arrays.stream(classPath.split(File.pathSeparator))
                .filter(entry -> !entry.endsWith("test-classes") && !entry.endsWith("test-classes" + File.separator))
                .collect(Collectors.joining(File.pathSeparator));
        List<String> command = new ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx384m", "-XX:TieredStopAtLevel=1", "-cp", mainOnly, "org.lpzplanner.LpzPlannerApplication",
                "--server.port=" + port, "--server.address=127.0.0.1", "--lpz.data-dir=" + dataDir.toAbsolutePath(),
                "--lpz.demo-data=false", "--spring.main.banner-mode=off"));
        ProcessBuilder builder = new ProcessBuilder(command).redirectErrorStream(true)
                .redirectOutput(ProcessBuilder.Redirect.appendTo(log.toFile()));
        // ignored by the app once the administrator exists, i.e. after the first start
        builder.environment().put("LPZ_ADMIN_EMAIL", ADMIN_EMAIL);
        builder.environment().put("LPZ_ADMIN_PASSWORD", ADMIN_PASSWORD);
        AppProcess app = new AppProcess(builder.start(), port);
        app.awaitReady(Duration.ofSeconds(120));
        try {
            app.token = ApiTokenOverHttp.create(app.uri("/"), ADMIN_EMAIL, ADMIN_PASSWORD, "durability test");
        } catch (Exception | Error e) {
            app.kill();
            throw e;
        }
        return app;
    }

    URI uri(String path) {
        return URI.create("http://127.0.0.1:" + port + path);
    }

    /** A request to the app's path, signed in with this start's API token. */
    HttpRequest.Builder request(String path) {
        return HttpRequest.newBuilder(uri(path)).header("Authorization", "Bearer " + token);
    }

    private void awaitReady(Duration timeout) throws Exception {
        HttpClient client = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(2)).build();
        long end = System.nanoTime() + timeout.toNanos();
        while (System.nanoTime() < end) {
            if (!process.isAlive()) {
                throw new IllegalStateException("the app exited with code " + process.exitValue() + " while starting");
            }
            try {
                HttpResponse<String> r = client.send(HttpRequest.newBuilder(uri("/actuator/health"))
                        .timeout(Duration.ofSeconds(2)).build(), HttpResponse.BodyHandlers.ofString());
                if (r.statusCode() == 200) {
                    return;
                }
            } catch (IOException notYet) {
                // not listening yet
            }
            Thread.sleep(200);
        }
        kill();
        throw new IllegalStateException("the app did not become healthy within " + timeout);
    }

    /** SIGKILL: no shutdown hook runs, nothing is flushed or closed. */
    void kill() throws InterruptedException {
        process.destroyForcibly();
        process.waitFor();
    }

    /** An orderly stop (SIGTERM), so that the database file can be opened by the test. */
    @Override
    public void close() throws InterruptedException {
        if (process.isAlive()) {
            process.destroy();
            if (!process.waitFor(30, java.util.concurrent.TimeUnit.SECONDS)) {
                kill();
            }
        }
    }
}

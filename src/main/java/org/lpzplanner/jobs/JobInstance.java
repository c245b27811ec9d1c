package org.lpzplanner.jobs;

import java.net.InetAddress;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.Map;
import java.util.UUID;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import jakarta.annotation.PreDestroy;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.context.event.ApplicationReadyEvent;
import org.springframework.context.event.EventListener;
import org.springframework.stereotype.Component;

/**
 * This app instance's part in the shared background jobs. The jobs themselves are rows every
 * instance reads ({@link JobStore}); the workers that run them are per instance, since they guard
 * this instance's processors and memory. While a job of this instance is queued or running, a
 * heartbeat writes its progress and the time to its row and reads back whether any instance was
 * asked to cancel it. A job whose row gave no sign of life for {@code lpz.jobs.stale-after} (its
 * instance died), or that an instance of the same name left unfinished before it restarted, reads
 * as failed with {@link #INTERRUPTED} instead of running for ever.
 */
@Component
public class JobInstance {

    public static final String INTERRUPTED = "interrupted: the app instance running this job stopped (restart or"
            + " crash) before it finished; nothing of it was stored, start it again";
    private static final Logger LOG = LoggerFactory.getLogger(JobInstance.class);

    private final JobStore store;
    private final Clock clock;
    private final String name;
    private final Duration heartbeat;
    private final Duration staleAfter;
    private final Instant startedAt;
    private final Map<String, LiveJob> live = new ConcurrentHashMap<>();
    private final ScheduledExecutorService beats = Executors.newSingleThreadScheduledExecutor(r -> {
        Thread t = new Thread(r, "job-heartbeat");
        t.setDaemon(true);
        return t;
    });
    private volatile Instant lastSweep = Instant.MIN;

    public JobInstance(JobStore store, Clock clock, @Value("${lpz.instance.name:}") String configuredName,
            @Value("${server.port:8080}") int port, @Value("${lpz.jobs.heartbeat:PT1S}") Duration heartbeat,
            @Value("${lpz.jobs.stale-after:PT30S}") Duration staleAfter) {
        this.store = store;
        this.clock = clock;
        this.name = configuredName == null || configuredName.isBlank() ? defaultName(port) : configuredName.strip();
        this.heartbeat = heartbeat;
        this.staleAfter = staleAfter;
        this.startedAt = clock.instant();
    }

    /** Host and port: stable across a restart of the same instance, distinct between instances. */
    private static String defaultName(int port) {
        String host;
        try {
            host = InetAddress.getLocalHost().getHostName();
        } catch (Exception e) {
            host = "unknown-host";
        }
        // port 0 (a random port) names nothing stable: such an instance relies on the heartbeat alone
        return port > 0 ? host + ":" + port : host + ":" + UUID.randomUUID();
    }

    public String name() {
        return name;
    }

    /**
     * Once the database is migrated: jobs this instance (by name) left unfinished when it last
     * stopped are failed at once, others' jobs without a sign of life too; then the heartbeat starts.
     */
    @EventListener(ApplicationReadyEvent.class)
    void started() {
        Instant now = clock.instant();
        int own = store.interruptInstance(name, startedAt, INTERRUPTED, now);
        if (own > 0) {
            LOG.warn("{} background jobs of this instance ({}) were unfinished when it last stopped; marked interrupted",
                    own, name);
        }
        sweep(now);
        long millis = Math.max(50, heartbeat.toMillis());
        beats.scheduleWithFixedDelay(this::beat, millis, millis, TimeUnit.MILLISECONDS);
    }

    /** Starts following a job of this instance; call before handing it to a worker. */
    public LiveJob track(String id, String stage) {
        LiveJob job = new LiveJob(id, stage);
        live.put(id, job);
        return job;
    }

    /** The job ended (or never started); its row says so already. */
    public void untrack(String id) {
        live.remove(id);
    }

    /** A cancel asked for on this instance reaches its own worker at once, without waiting for a heartbeat. */
    public void cancelLocally(String id) {
        LiveJob job = live.get(id);
        if (job != null) {
            job.requestCancel();
        }
    }

    /** Whether the worker of this job should stop: asked here, or (at the last heartbeat) anywhere. */
    public boolean cancelRequested(String id) {
        LiveJob job = live.get(id);
        return job != null && job.cancelRequested();
    }

    /**
     * The stored job as a reader should see it: an unfinished job of a dead instance is failed first
     * (and so stays), so that nobody waits for it.
     */
    public StoredJob current(StoredJob job) {
        if (job.active() && !live.containsKey(job.id())
                && job.heartbeatAt().isBefore(clock.instant().minus(staleAfter))) {
            sweep(clock.instant());
            return store.find(job.id()).orElse(job);
        }
        return job;
    }

    private void sweep(Instant now) {
        lastSweep = now;
        int stale = store.interruptStale(now.minus(staleAfter), INTERRUPTED, now);
        if (stale > 0) {
            LOG.warn("{} background jobs gave no sign of life for {}; marked interrupted", stale, staleAfter);
        }
    }

    private void beat() {
        try {
            Instant now = clock.instant();
            if (!live.isEmpty()) {
                for (LiveJob job : live.values()) {
                    store.beat(job.id(), job.stage(), job.fraction(), now);
                }
                for (String id : store.cancelRequested(name)) {
                    cancelLocally(id);
                }
            }
            if (lastSweep.isBefore(now.minus(staleAfter.dividedBy(2)))) {
                sweep(now);
            }
        } catch (RuntimeException e) {
            LOG.warn("job heartbeat of instance {} failed: {}", name, e.getMessage());
        }
    }

    /** A stopping instance says so for the jobs it will not finish. */
    @PreDestroy
    void stop() {
        beats.shutdownNow();
        if (live.isEmpty()) {
            return;
        }
        try {
            store.interruptInstance(name, clock.instant().plusSeconds(1), INTERRUPTED, clock.instant());
        } catch (RuntimeException e) {
            LOG.warn("could not mark the unfinished jobs of instance {} as interrupted: {}", name, e.getMessage());
        }
    }
}

package org.lpzplanner.analysis;

import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Component;

/**
 * Bounds how many analyses run at once in this instance, whoever asks: a page, the API, an edit of
 * the air-termination or a background job. A caller waits a short while for a free place and is
 * then told to come back later ({@link AnalysisBusyException}, 429 with Retry-After) instead of
 * piling more grids into memory than the machine holds.
 */
@Component
public class AnalysisCapacity {

    private final Semaphore places;
    private final long waitMillis;
    private final int retryAfterSeconds;

    public AnalysisCapacity(@Value("${lpz.analysis.concurrent:4}") int concurrent,
            @Value("${lpz.analysis.wait-seconds:20}") double waitSeconds,
            @Value("${lpz.analysis.retry-after-seconds:5}") int retryAfterSeconds) {
        this.places = new Semaphore(Math.max(1, concurrent), true);
        this.waitMillis = Math.max(0, Math.round(waitSeconds * 1000));
        this.retryAfterSeconds = retryAfterSeconds;
    }

    /**
     * Runs the analysis once a place is free.
     *
     * @throws AnalysisBusyException when no place came free within the wait
     */
    public <T> T run(Supplier<T> analysis) {
        boolean entered;
        try {
            entered = places.tryAcquire(waitMillis, TimeUnit.MILLISECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AnalysisBusyException(retryAfterSeconds);
        }
        if (!entered) {
            throw new AnalysisBusyException(retryAfterSeconds);
        }
        try {
            return analysis.get();
        } finally {
            places.release();
        }
    }
}

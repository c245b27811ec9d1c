package org.lpzplanner.system;

import java.time.Clock;
import java.time.Instant;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.concurrent.atomic.AtomicReference;

/**
 * The clock of every Spring test context: the system's UTC clock, or a fixed instant while a test
 * marked {@link FixedClock} runs, so that a time the app prints (a report's date, a comment's time)
 * is the same in two prints. One per test JVM (test classes run one after another); registered as
 * the primary {@link Clock} by {@link TestClockCustomizerFactory}, so every context shares it.
 */
public final class TestClock extends Clock {

    private static final AtomicReference<Instant> FIXED = new AtomicReference<>();

    /** From now until {@link #release()}, every instant is {@code at}. */
    public static void fixAt(Instant at) {
        FIXED.set(at);
    }

    /** Back to the system clock. */
    public static void release() {
        FIXED.set(null);
    }

    @Override
    public Instant instant() {
        Instant fixed = FIXED.get();
        return fixed != null ? fixed : Instant.now();
    }

    @Override
    public ZoneId getZone() {
        return ZoneOffset.UTC;
    }

    @Override
    public Clock withZone(ZoneId zone) {
        throw new UnsupportedOperationException("the app's clock is UTC");
    }
}

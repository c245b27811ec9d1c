package org.lpzplanner.heavywork;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

/**
 * One place of the instance's {@link HeavyWorkCapacity}, taken on a thread of its own as a running
 * computation would take it, until {@link #close()}: tests use it to find out what the app answers
 * while every place is taken.
 */
public final class HeldPlace implements AutoCloseable {

    private final CountDownLatch release = new CountDownLatch(1);
    private final Thread holder;

    private HeldPlace(HeavyWorkCapacity capacity) throws InterruptedException {
        CountDownLatch holding = new CountDownLatch(1);
        holder = new Thread(() -> capacity.run("analysis", () -> {
            holding.countDown();
            try {
                release.await(120, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return null;
        }), "held-place");
        holder.start();
        if (!holding.await(10, TimeUnit.SECONDS)) {
            close();
            throw new IllegalStateException("no place of the capacity came free within 10 s");
        }
    }

    /** Takes a place, waiting up to 10 s for one. */
    public static HeldPlace take(HeavyWorkCapacity capacity) throws InterruptedException {
        return new HeldPlace(capacity);
    }

    @Override
    public void close() throws InterruptedException {
        release.countDown();
        holder.join(10_000);
    }
}

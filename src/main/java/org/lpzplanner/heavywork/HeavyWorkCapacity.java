package org.lpzplanner.heavywork;

import java.math.BigDecimal;
import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;
import org.lpzplanner.engine.design.proposal.ProposalMonitor;
import org.lpzplanner.engine.exposure.AnalysisProgress;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Component;

/**
 * Bounds how many long computations run at once in this instance, whoever asks and whatever they
 * compute: analyses (page, API, an edit, a background job, an import), method checks, separation
 * surveys, bills of quantities, section envelopes, printed reports and proposals. A caller waits a
 * short while for a free place ({@code lpz.analysis.wait-seconds}) and is then told to come back
 * later ({@link HeavyWorkBusyException}, 429 with Retry-After) instead of piling more grids into
 * memory than the machine holds.
 *
 * <p>A thread that already holds a place runs nested work (an analysis inside a report) in that
 * place: it never waits for a second one, so nesting cannot deadlock and one request never takes
 * two places.
 *
 * <p>Time budget: from the moment it gets its place a computation has {@code lpz.heavy.budget-seconds}.
 * Work that reports to {@link #budgeted(AnalysisProgress)} or {@link #budgeted(ProposalMonitor)}
 * (the engine asks them between items) or calls {@link #checkBudget()} between steps is stopped at
 * its next check once the budget has passed ({@link HeavyWorkOverBudgetException}, 503 with
 * Retry-After). Engine steps without such a hook (the envelope of a section or a report, a separation
 * survey, a bill of quantities) run to their end and are stopped only at the next check after them.
 *
 * <p>Thread safety: safe for any number of threads; the budgeted progress objects may be asked from
 * the engine's worker threads.
 */
@Component
public class HeavyWorkCapacity {

    /** The budget when none is configured: generous for the largest sites an instance accepts. */
    public static final double DEFAULT_BUDGET_SECONDS = 120;

    private static final ThreadLocal<Held> HELD = new ThreadLocal<>();

    private final Semaphore places;
    private final long waitMillis;
    private final int retryAfterSeconds;
    private final long budgetNanos;
    private final String budgetText;

    @Autowired
    public HeavyWorkCapacity(@Value("${lpz.analysis.concurrent:4}") int concurrent,
            @Value("${lpz.analysis.wait-seconds:20}") double waitSeconds,
            @Value("${lpz.analysis.retry-after-seconds:5}") int retryAfterSeconds,
            @Value("${lpz.heavy.budget-seconds:" + DEFAULT_BUDGET_SECONDS + "}") double budgetSeconds) {
        if (!(budgetSeconds >= 0) || Double.isInfinite(budgetSeconds)) {
            throw new IllegalArgumentException("lpz.heavy.budget-seconds must be a number of seconds of 0 or more, got "
                    + budgetSeconds);
        }
        this.places = new Semaphore(Math.max(1, concurrent), true);
        this.waitMillis = Math.max(0, Math.round(waitSeconds * 1000));
        this.retryAfterSeconds = retryAfterSeconds;
        this.budgetNanos = Math.round(budgetSeconds * 1e9);
        this.budgetText = BigDecimal.valueOf(budgetSeconds).stripTrailingZeros().toPlainString();
    }

    /** With the default time budget. */
    public HeavyWorkCapacity(int concurrent, double waitSeconds, int retryAfterSeconds) {
        this(concurrent, waitSeconds, retryAfterSeconds, DEFAULT_BUDGET_SECONDS);
    }

    /**
     * Runs {@code work} once a place is free, or at once in the place this thread already holds.
     *
     * @param what the computation in plain words ("method check"), for the answers
     * @throws HeavyWorkBusyException when no place came free within the wait
     */
    public <T> T run(String what, Supplier<T> work) {
        if (HELD.get() != null) {
            return work.get();
        }
        boolean entered;
        try {
            entered = places.tryAcquire(waitMillis, TimeUnit.MILLISECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new HeavyWorkBusyException(what, retryAfterSeconds);
        }
        if (!entered) {
            throw new HeavyWorkBusyException(what, retryAfterSeconds);
        }
        HELD.set(new Held(what, System.nanoTime() + budgetNanos));
        try {
            return work.get();
        } finally {
            HELD.remove();
            places.release();
        }
    }

    /** True when this thread holds a place (it runs inside {@link #run}). */
    public boolean holdsPlace() {
        return HELD.get() != null;
    }

    /**
     * Stops the computation of this thread when its budget has passed; does nothing outside
     * {@link #run}.
     *
     * @throws HeavyWorkOverBudgetException when the budget has passed
     */
    public void checkBudget() {
        Held held = HELD.get();
        if (held != null) {
            held.check();
        }
    }

    /**
     * {@code progress}, which also stops the analysis once this thread's budget has passed. Outside
     * {@link #run} it is {@code progress} itself. May be asked from any thread.
     */
    public AnalysisProgress budgeted(AnalysisProgress progress) {
        Held held = HELD.get();
        if (held == null) {
            return progress;
        }
        return new AnalysisProgress() {
            @Override
            public void stage(String stage, double fractionDone) {
                progress.stage(stage, fractionDone);
            }

            @Override
            public boolean cancelled() {
                return held.passed() || progress.cancelled();
            }

            @Override
            public void checkCancelled() {
                held.check();
                progress.checkCancelled();
            }
        };
    }

    /**
     * {@code monitor}, which also stops the proposal once this thread's budget has passed (it then
     * ends with {@link HeavyWorkOverBudgetException}, not as cancelled). Outside {@link #run} it is
     * {@code monitor} itself.
     */
    public ProposalMonitor budgeted(ProposalMonitor monitor) {
        Held held = HELD.get();
        if (held == null) {
            return monitor;
        }
        return new ProposalMonitor() {
            @Override
            public void progress(String stage, double fraction) {
                monitor.progress(stage, fraction);
            }

            @Override
            public boolean isCancelled() {
                held.check();
                return monitor.isCancelled();
            }
        };
    }

    /** The time budget of one computation, in seconds as configured ("120"). */
    public String budgetSeconds() {
        return budgetText;
    }

    /** Seconds a refused caller is asked to wait. */
    public int retryAfterSeconds() {
        return retryAfterSeconds;
    }

    private final class Held {

        private final String what;
        private final long deadline;

        Held(String what, long deadline) {
            this.what = what;
            this.deadline = deadline;
        }

        boolean passed() {
            return System.nanoTime() - deadline >= 0;
        }

        void check() {
            if (passed()) {
                throw new HeavyWorkOverBudgetException(what, budgetText, retryAfterSeconds);
            }
        }
    }
}

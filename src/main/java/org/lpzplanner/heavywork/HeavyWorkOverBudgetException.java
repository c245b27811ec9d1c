package org.lpzplanner.heavywork;

import org.lpzplanner.system.OverBudgetException;

/** A long computation ran past its time budget and was stopped; nothing of it was kept or stored. */
public final class HeavyWorkOverBudgetException extends OverBudgetException {

    private static final long serialVersionUID = 1L;

    public HeavyWorkOverBudgetException(String what, String budget, int retryAfterSeconds) {
        super("the " + what + " was stopped: it took longer than its time budget of " + budget
                + " s; nothing was stored. Try again in " + retryAfterSeconds + " s, when the server may be"
                + " less busy, or make the site smaller (fewer structures, a coarser grid)", retryAfterSeconds);
    }
}

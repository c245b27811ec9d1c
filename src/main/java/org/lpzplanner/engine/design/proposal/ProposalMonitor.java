package org.lpzplanner.engine.design.proposal;

/**
 * Hears how far a proposal has come and may ask it to stop. Called from the proposing thread.
 */
public interface ProposalMonitor {

    /** The proposal is at {@code stage} (plain words) and about {@code fraction} (0..1) done. */
    void progress(String stage, double fraction);

    /** True when the proposal should stop; it then throws {@link ProposalCancelledException}. */
    boolean isCancelled();

    /** A monitor that hears nothing and never cancels. */
    ProposalMonitor NONE = new ProposalMonitor() {
        @Override
        public void progress(String stage, double fraction) {
        }

        @Override
        public boolean isCancelled() {
            return false;
        }
    };
}

package org.lpzplanner.engine.design.proposal;

/** Thrown when a {@link ProposalMonitor} asked a proposal to stop; nothing is returned then. */
public class ProposalCancelledException extends RuntimeException {

    public ProposalCancelledException() {
        super("the proposal was cancelled");
    }
}

package org.lpzplanner.design;

import java.util.Map;
import java.util.UUID;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicBoolean;
import jakarta.annotation.PreDestroy;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.engine.design.proposal.AirTerminationProposer;
import org.lpzplanner.engine.design.proposal.Proposal;
import org.lpzplanner.engine.design.proposal.ProposalCancelledException;
import org.lpzplanner.engine.design.proposal.ProposalMonitor;
import org.lpzplanner.engine.design.proposal.ProposalOptions;
import org.lpzplanner.engine.envelope.AnalysisTooLargeException;
import org.lpzplanner.engine.model.Site;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.stereotype.Component;

/**
 * Runs proposals one at a time in the background (a proposal uses every core) and keeps the latest
 * {@value #KEEP} of them in memory, so a page can poll progress and take the result. Jobs do not
 * survive a restart; a proposal is quick to run again.
 */
@Component
public class ProposalJobs {

    static final int KEEP = 20;
    private static final Logger LOG = LoggerFactory.getLogger(ProposalJobs.class);

    /** Where a job stands. */
    public enum State { RUNNING, DONE, FAILED, CANCELLED }

    /** One proposal run; mutable fields are volatile, written by the worker, read by requests. */
    public static final class Job {
        final String id;
        final long siteId;
        final long siteVersion;
        final ProposalOptions options;
        final Site site;
        final AtomicBoolean cancel = new AtomicBoolean();
        volatile State state = State.RUNNING;
        volatile String stage = "waiting";
        volatile double fraction;
        volatile Proposal result;
        volatile String error;
        /** What accepting it added, and the site's version after that; null until accepted or after an undo. */
        volatile DesignService.Accepted accepted;

        Job(String id, long siteId, long siteVersion, Site site, ProposalOptions options) {
            this.id = id;
            this.siteId = siteId;
            this.siteVersion = siteVersion;
            this.site = site;
            this.options = options;
        }

        public String id() { return id; }
        public long siteId() { return siteId; }
        public long siteVersion() { return siteVersion; }
        public State state() { return state; }
        public String stage() { return stage; }
        public double fraction() { return fraction; }
        public Proposal result() { return result; }
        public String error() { return error; }
        public DesignService.Accepted accepted() { return accepted; }
        public Site site() { return site; }
        public ProposalOptions options() { return options; }
    }

    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "proposal-worker");
        t.setDaemon(true);
        return t;
    });
    private final Map<String, Job> jobs = new ConcurrentHashMap<>();

    public Job start(long siteId, long siteVersion, Site site, ProposalOptions options) {
        Job job = new Job(UUID.randomUUID().toString().substring(0, 12), siteId, siteVersion, site, options);
        if (jobs.size() >= KEEP) {
            jobs.values().stream().filter(j -> j.state != State.RUNNING).findFirst().ifPresent(j -> jobs.remove(j.id));
        }
        jobs.put(job.id, job);
        // the worker acts for the person who started the proposal, like every background task
        worker.submit(CurrentAccount.carry(() -> run(job)));
        return job;
    }

    /**
     * The job, or null when there is none with this id for this site. Callers first read the site
     * through SiteService, which answers 404 for another team's site, so a job is only found by
     * its own team.
     */
    public Job get(long siteId, String jobId) {
        Job job = jobs.get(jobId);
        return job != null && job.siteId == siteId ? job : null;
    }

    public void cancel(Job job) {
        job.cancel.set(true);
    }

    private void run(Job job) {
        if (job.cancel.get()) {
            job.state = State.CANCELLED;
            return;
        }
        try {
            job.result = AirTerminationProposer.propose(job.site, job.options, new ProposalMonitor() {
                @Override
                public void progress(String stage, double fraction) {
                    job.stage = stage;
                    job.fraction = fraction;
                }

                @Override
                public boolean isCancelled() {
                    return job.cancel.get();
                }
            });
            job.state = State.DONE;
        } catch (ProposalCancelledException e) {
            job.state = State.CANCELLED;
        } catch (AnalysisTooLargeException | IllegalArgumentException e) {
            job.error = e.getMessage();
            job.state = State.FAILED;
        } catch (RuntimeException e) {
            LOG.error("proposal {} for site {} failed", job.id, job.siteId, e);
            job.error = "the proposal could not be computed; the server log has the details";
            job.state = State.FAILED;
        }
    }

    @PreDestroy
    void stop() {
        jobs.values().forEach(j -> j.cancel.set(true));
        worker.shutdownNow();
    }
}

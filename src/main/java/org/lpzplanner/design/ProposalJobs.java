package org.lpzplanner.design;

import java.time.Clock;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import jakarta.annotation.PreDestroy;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.engine.design.proposal.AirTerminationProposer;
import org.lpzplanner.engine.design.proposal.Proposal;
import org.lpzplanner.engine.design.proposal.ProposalCancelledException;
import org.lpzplanner.engine.design.proposal.ProposalMonitor;
import org.lpzplanner.engine.design.proposal.ProposalOptions;
import org.lpzplanner.engine.envelope.AnalysisTooLargeException;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.heavywork.HeavyWorkCapacity;
import org.lpzplanner.jobs.JobInstance;
import org.lpzplanner.jobs.JobStore;
import org.lpzplanner.jobs.LiveJob;
import org.lpzplanner.jobs.StoredJob;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.stereotype.Component;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Runs proposals one at a time in the background (a proposal uses every core of this instance) and
 * stores each as a row of {@code background_jobs} ({@link JobStore}): progress, outcome (the
 * proposal's parts and figures as JSON) and what accepting it added. So any app instance answers a
 * poll, a cancel, an accept or its undo, also after a restart. Finished proposals are kept for a
 * day, at most {@value #KEEP} per site. A proposal takes a place of the instance's
 * {@link HeavyWorkCapacity} while it runs and has its time budget: one that finds no place, or runs past
 * its budget, fails saying so and may be started again.
 */
@Component
public class ProposalJobs {

    static final int KEEP = 20;
    static final Duration KEPT_FOR = Duration.ofDays(1);
    private static final Logger LOG = LoggerFactory.getLogger(ProposalJobs.class);

    /** Where a job stands. */
    public enum State { RUNNING, DONE, FAILED, CANCELLED }

    /**
     * A proposal job as stored.
     *
     * @param result   the proposal's parts and figures once done ({@link StoredProposal}), else null
     * @param accepted what accepting it added, and the site's version after that; null until accepted or after an undo
     */
    public record Job(String id, long siteId, long siteVersion, State state, String stage, double fraction,
            String level, double radius, String error, StoredProposal result, AcceptedProposal accepted) {
    }

    private final JobStore store;
    private final JobInstance instance;
    private final Clock clock;
    private final JsonMapper json;
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "proposal-worker");
        t.setDaemon(true);
        return t;
    });

    private final HeavyWorkCapacity capacity;

    public ProposalJobs(JobStore store, JobInstance instance, Clock clock, JsonMapper json,
            HeavyWorkCapacity capacity) {
        this.capacity = capacity;
        this.store = store;
        this.instance = instance;
        this.clock = clock;
        this.json = json;
    }

    public Job start(long siteId, long siteVersion, Site site, ProposalOptions options) {
        String id = UUID.randomUUID().toString().substring(0, 12);
        Map<String, Object> settings = new LinkedHashMap<>();
        settings.put("level", options.sphere().level().name());
        settings.put("radius", options.sphere().radius());
        store.insert(new JobStore.NewJob(id, JobStore.PROPOSAL, siteId, CurrentAccount.teamId(),
                CurrentAccount.actorName(), JobStore.RUNNING, "waiting", siteVersion, json.writeValueAsString(settings),
                instance.name()), clock.instant());
        LiveJob live = instance.track(id, "waiting");
        // the worker acts for the person who started the proposal, like every background task
        worker.submit(CurrentAccount.carry(() -> run(live, site, options)));
        store.prune(siteId, JobStore.PROPOSAL, KEEP, clock.instant().minus(KEPT_FOR));
        return get(siteId, id);
    }

    /**
     * The job, or null when there is none with this id for this site of the caller's team (callers
     * first read the site through SiteService, which answers 404 for another team's site).
     */
    public Job get(long siteId, String jobId) {
        return store.find(JobStore.PROPOSAL, siteId, CurrentAccount.teamId(), jobId).map(instance::current)
                .map(this::job).orElse(null);
    }

    /** Asks the proposal to stop, whichever instance runs it. */
    public void cancel(Job job) {
        store.requestCancel(job.id(), false, clock.instant());
        instance.cancelLocally(job.id());
    }

    /** Records what accepting the proposal added (null: it was taken back). */
    void accepted(Job job, AcceptedProposal accepted) {
        store.setAccepted(job.id(), accepted == null ? null : json.writeValueAsString(accepted));
    }

    private void run(LiveJob live, Site site, ProposalOptions options) {
        String id = live.id();
        try {
            if (live.cancelRequested() || store.find(id).map(StoredJob::cancelRequested).orElse(true)) {
                store.finish(id, JobStore.CANCELLED, null, null, null, clock.instant());
                return;
            }
            ProposalMonitor monitor = new ProposalMonitor() {
                @Override
                public void progress(String stage, double fraction) {
                    live.progress(stage, fraction);
                }

                @Override
                public boolean isCancelled() {
                    return instance.cancelRequested(id);
                }
            };
            Proposal proposal = capacity.run("proposal",
                    () -> AirTerminationProposer.propose(site, options, capacity.budgeted(monitor)));
            store.finish(id, JobStore.DONE, null, json.writeValueAsString(StoredProposal.of(proposal)), null,
                    clock.instant());
        } catch (ProposalCancelledException e) {
            store.finish(id, JobStore.CANCELLED, null, null, null, clock.instant());
        } catch (AnalysisTooLargeException | IllegalArgumentException | org.lpzplanner.system.BusyException
                | org.lpzplanner.system.OverBudgetException e) {
            store.finish(id, JobStore.FAILED, null, null, e.getMessage(), clock.instant());
        } catch (RuntimeException e) {
            LOG.error("proposal {} failed", id, e);
            try {
                store.finish(id, JobStore.FAILED, null, null,
                        "the proposal could not be computed; the server log has the details", clock.instant());
            } catch (RuntimeException stored) {
                LOG.error("proposal {}: its failure could not be stored", id, stored);
            }
        } finally {
            instance.untrack(id);
        }
    }

    private Job job(StoredJob s) {
        JsonNode settings = s.settingsJson() == null ? json.createObjectNode() : json.readTree(s.settingsJson());
        StoredProposal result = s.outcomeJson() == null ? null : json.readValue(s.outcomeJson(), StoredProposal.class);
        AcceptedProposal accepted = s.acceptedJson() == null ? null
                : json.readValue(s.acceptedJson(), AcceptedProposal.class);
        return new Job(s.id(), s.siteId(), s.siteVersion() == null ? -1 : s.siteVersion(),
                State.valueOf(JobStore.QUEUED.equals(s.state()) ? JobStore.RUNNING : s.state()), s.stage(), s.fraction(),
                settings.path("level").asString(), settings.path("radius").asDouble(), s.error(), result, accepted);
    }

    @PreDestroy
    void stop() {
        worker.shutdownNow();
    }
}

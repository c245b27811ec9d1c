package org.lpzplanner.analysis;

import java.time.Clock;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.stereotype.Service;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * The review of a site's latest analysis: its exposed edges, corners and facade bands and its
 * model warnings ({@link ReviewItems}) and which of them a designer accepted, with a reason, as
 * needing no air-termination (for a warning: as looked at and answered). An accepted warning still
 * stands: the revision's {@code fullyProtected} stays false, and no page or report says that no
 * exposed items remain while a warning stands. Acceptances belong to one analysis revision; a new analysis takes over those of
 * the revision before for the items that are still exposed unchanged (see {@link AnalysisService}).
 */
@Service
public class ReviewService {

    /** Longest reason stored, in characters. */
    public static final int MAX_REASON = 500;

    private final AnalysisService analyses;
    private final AcceptedItemRepository accepted;
    private final TransactionTemplate transactions;
    private final Clock clock;

    private final AuditTrail audit;
    private final ParsedResults results;

    public ReviewService(AnalysisService analyses, AcceptedItemRepository accepted, TransactionTemplate transactions,
            Clock clock, AuditTrail audit, ParsedResults results) {
        this.audit = audit;
        this.results = results;
        this.analyses = analyses;
        this.accepted = accepted;
        this.transactions = transactions;
        this.clock = clock;
    }

    /** The review items of one revision and the reasons of the accepted ones, by key. */
    public record Review(AnalysisRevision revision, List<ReviewItems.Item> items, Map<String, String> accepted) {

        public int acceptedCount() {
            return (int) items.stream().filter(i -> accepted.containsKey(i.key())).count();
        }
    }

    /**
     * The review of the site's latest analysis, empty when it was never analysed.
     *
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id
     */
    public Optional<Review> latest(long siteId) {
        return analyses.latest(siteId).map(this::review);
    }

    /** The review of a revision read with its result GeoJSON. */
    public Review review(AnalysisRevision revision) {
        return new Review(revision, results.of(revision).items(), accepted.reasons(revision.id()));
    }

    /**
     * Marks an item of the latest analysis accepted (or changes its reason).
     *
     * @throws InvalidInputException when the key is missing or the reason blank or too long
     * @throws ReviewItemNotFoundException when the latest analysis has no item with this key
     */
    public Review accept(long siteId, String key, String reason) {
        String k = requiredKey(key);
        String r = reason == null ? "" : reason.strip();
        if (r.isEmpty()) {
            throw new InvalidInputException("reason", "reason is required: say why this item needs no"
                    + " air-termination, for example \"covered by a natural component\"");
        }
        if (r.length() > MAX_REASON) {
            throw new InvalidInputException("reason", "reason must be at most " + MAX_REASON
                    + " characters, got " + r.length());
        }
        return transactions.execute(status -> {
            Review review = itemReview(siteId, k);
            accepted.accept(review.revision().id(), k, r, clock.instant().truncatedTo(ChronoUnit.MILLIS));
            audit.record(siteId, "accept", "accepted " + k + " of revision " + review.revision().revision()
                    + ": " + r);
            return review(review.revision());
        });
    }

    /**
     * Takes back the acceptance of an item of the latest analysis; an item not accepted stays so.
     *
     * @throws ReviewItemNotFoundException when the latest analysis has no item with this key
     */
    public Review remove(long siteId, String key) {
        String k = requiredKey(key);
        return transactions.execute(status -> {
            Review review = itemReview(siteId, k);
            accepted.remove(review.revision().id(), k);
            audit.record(siteId, "unaccept", "marked " + k + " of revision " + review.revision().revision()
                    + " exposed again");
            return review(review.revision());
        });
    }

    private Review itemReview(long siteId, String key) {
        Review review = latest(siteId).orElseThrow(() -> new ReviewItemNotFoundException(
                "site " + siteId + " has not been analysed yet, so it has no exposed items"));
        if (review.items().stream().noneMatch(i -> i.key().equals(key))) {
            throw new ReviewItemNotFoundException("the latest analysis of site " + siteId
                    + " has no exposed item with key \"" + key + "\"; reload the review list");
        }
        return review;
    }

    private static String requiredKey(String key) {
        if (key == null || key.isBlank()) {
            throw new InvalidInputException("key", "key is required: the key of an exposed item of the review list");
        }
        return key.strip();
    }
}

package org.lpzplanner.comments;

import java.sql.Timestamp;
import java.time.Clock;
import java.time.temporal.ChronoUnit;
import java.util.List;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ReviewItemNotFoundException;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.jdbc.support.GeneratedKeyHolder;
import org.springframework.jdbc.support.KeyHolder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Comments on a site and the reviewed mark of its latest analysis revision: what every role of
 * the site's team may add, reviewers included. Both go into the audit trail.
 */
@Service
public class CommentService {

    /** Longest comment kept, in characters. */
    public static final int MAX_COMMENT = 4000;

    private final JdbcClient jdbc;
    private final SiteService sites;
    private final AnalysisService analyses;
    private final AuditTrail audit;
    private final Clock clock;

    public CommentService(JdbcClient jdbc, SiteService sites, AnalysisService analyses, AuditTrail audit,
            Clock clock) {
        this.jdbc = jdbc;
        this.sites = sites;
        this.analyses = analyses;
        this.audit = audit;
        this.clock = clock;
    }

    /**
     * @throws org.lpzplanner.sites.SiteNotFoundException when the team has no such site
     * @throws InvalidInputException when the comment is blank or too long
     */
    @Transactional
    public SiteComment comment(long siteId, String body) {
        sites.get(siteId);
        String text = body == null ? "" : body.strip();
        if (text.isEmpty()) {
            throw new InvalidInputException("comment", "the comment is empty");
        }
        if (text.length() > MAX_COMMENT) {
            throw new InvalidInputException("comment", "a comment must be at most " + MAX_COMMENT
                    + " characters, got " + text.length());
        }
        var now = clock.instant().truncatedTo(ChronoUnit.MILLIS);
        String author = CurrentAccount.actorName();
        KeyHolder keys = new GeneratedKeyHolder();
        jdbc.sql("INSERT INTO site_comments (site_id, author, body, created_at) VALUES (?, ?, ?, ?)")
                .params(siteId, author, text, Timestamp.from(now)).update(keys, "id");
        audit.record(siteId, "comment", text.length() > 200 ? text.substring(0, 199) + "\u2026" : text);
        return new SiteComment(keys.getKeyAs(Number.class).longValue(), siteId, author, text, now);
    }

    /** The site's comments, oldest first. */
    @Transactional(readOnly = true)
    public List<SiteComment> comments(long siteId) {
        sites.get(siteId);
        return jdbc.sql("SELECT id, site_id, author, body, created_at FROM site_comments WHERE site_id = ?"
                        + " ORDER BY created_at, id").param(siteId)
                .query((rs, n) -> new SiteComment(rs.getLong("id"), rs.getLong("site_id"), rs.getString("author"),
                        rs.getString("body"), rs.getTimestamp("created_at").toInstant()))
                .list();
    }

    /**
     * Marks the site's latest analysis revision reviewed by whoever acts; marking it twice keeps
     * the first mark.
     *
     * @throws ReviewItemNotFoundException when the site has no analysis yet
     */
    @Transactional
    public RevisionReview markReviewed(long siteId) {
        AnalysisRevision latest = analyses.latest(siteId).orElseThrow(() -> new ReviewItemNotFoundException(
                "site " + siteId + " has not been analysed yet, so there is no revision to mark reviewed"));
        String reviewer = CurrentAccount.actorName();
        var now = clock.instant().truncatedTo(ChronoUnit.MILLIS);
        int existing = jdbc.sql("SELECT COUNT(*) FROM revision_reviews WHERE revision_id = ? AND reviewer = ?")
                .params(latest.id(), reviewer).query(Integer.class).single();
        if (existing == 0) {
            jdbc.sql("INSERT INTO revision_reviews (revision_id, reviewer, reviewed_at) VALUES (?, ?, ?)")
                    .params(latest.id(), reviewer, Timestamp.from(now)).update();
            audit.record(siteId, "reviewed", "marked revision " + latest.revision() + " reviewed");
        }
        return reviews(siteId).stream().filter(r -> r.reviewer().equals(reviewer)).findFirst()
                .orElse(new RevisionReview(latest.revision(), reviewer, now));
    }

    /** Who marked the latest revision reviewed, earliest first; empty when none or not analysed. */
    @Transactional(readOnly = true)
    public List<RevisionReview> reviews(long siteId) {
        return analyses.latest(siteId).map(latest -> jdbc.sql("SELECT reviewer, reviewed_at FROM revision_reviews"
                        + " WHERE revision_id = ? ORDER BY reviewed_at, id").param(latest.id())
                .query((rs, n) -> new RevisionReview(latest.revision(), rs.getString("reviewer"),
                        rs.getTimestamp("reviewed_at").toInstant()))
                .list()).orElse(List.of());
    }
}

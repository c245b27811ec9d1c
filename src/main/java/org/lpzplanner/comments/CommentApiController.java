package org.lpzplanner.comments;

import java.util.List;
import org.lpzplanner.audit.AuditEvent;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;
import tools.jackson.databind.JsonNode;

/**
 * JSON API of comments, the reviewed mark and the audit trail:
 * {@code GET|POST /api/sites/{id}/comments} (JSON {@code {"comment": "..."}}),
 * {@code GET|POST /api/sites/{id}/analyses/latest/reviewed} and {@code GET /api/sites/{id}/audit}.
 */
@RestController
@RequestMapping("/api/sites/{siteId}")
public class CommentApiController {

    private final CommentService comments;
    private final SiteService sites;
    private final AuditTrail audit;

    public CommentApiController(CommentService comments, SiteService sites, AuditTrail audit) {
        this.comments = comments;
        this.sites = sites;
        this.audit = audit;
    }

    @GetMapping("/comments")
    public List<SiteComment> list(@PathVariable long siteId) {
        return comments.comments(siteId);
    }

    @PostMapping(value = "/comments", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ResponseEntity<SiteComment> add(@PathVariable long siteId, @RequestBody JsonNode body) {
        JsonNode text = body.get("comment");
        if (text == null || !text.isString()) {
            throw new InvalidInputException("comment", "send a JSON object with \"comment\" as a string");
        }
        return ResponseEntity.status(HttpStatus.CREATED).body(comments.comment(siteId, text.stringValue()));
    }

    @GetMapping("/analyses/latest/reviewed")
    public List<RevisionReview> reviews(@PathVariable long siteId) {
        sites.get(siteId);
        return comments.reviews(siteId);
    }

    @PostMapping("/analyses/latest/reviewed")
    public RevisionReview markReviewed(@PathVariable long siteId) {
        return comments.markReviewed(siteId);
    }

    /** The site's changes, newest first (at most 500). */
    @GetMapping("/audit")
    public List<AuditEvent> audit(@PathVariable long siteId) {
        sites.get(siteId);
        return audit.forSite(siteId, 500);
    }
}

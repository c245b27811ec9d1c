package org.lpzplanner.comments;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.List;
import org.lpzplanner.audit.AuditEvent;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.sites.SiteService;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

/**
 * JSON API of comments, the reviewed mark and the audit trail:
 * {@code GET|POST /api/sites/{id}/comments} ({@link NewComment}),
 * {@code GET|POST /api/sites/{id}/analyses/latest/reviewed} and {@code GET /api/sites/{id}/audit}.
 * Every role of the team may comment and mark reviewed. Errors are problem details, see
 * {@link org.lpzplanner.system.ApiErrorHandler}.
 */
@RestController
@Tag(name = "Review")
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

    @Operation(summary = "Comments on a site", description = "Oldest first; the text is the user's, escape it when shown")
    @ApiResponse(responseCode = "200", description = "The comments")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping("/comments")
    public List<SiteComment> list(@PathVariable long siteId) {
        return comments.comments(siteId);
    }

    @Operation(summary = "Comment on a site", description = "Every role may comment; recorded in the site's history")
    @ApiResponse(responseCode = "201", description = "The comment as stored")
    @ApiResponse(responseCode = "400", description = "The comment is missing, not text, blank or too long; the field is named")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @PostMapping(value = "/comments", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ResponseEntity<SiteComment> add(@PathVariable long siteId, @Valid @RequestBody NewComment body) {
        return ResponseEntity.status(HttpStatus.CREATED).body(comments.comment(siteId, body.comment()));
    }

    @Operation(summary = "Who marked analysis revisions of a site reviewed, and when")
    @ApiResponse(responseCode = "200", description = "The reviewed marks")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping("/analyses/latest/reviewed")
    public List<RevisionReview> reviews(@PathVariable long siteId) {
        sites.get(siteId);
        return comments.reviews(siteId);
    }

    @Operation(summary = "Mark the latest analysis revision reviewed", description = "Every role may mark it")
    @ApiResponse(responseCode = "200", description = "The mark")
    @ApiResponse(responseCode = "404", description = "No such site, or it was never analysed")
    @PostMapping("/analyses/latest/reviewed")
    public RevisionReview markReviewed(@PathVariable long siteId) {
        return comments.markReviewed(siteId);
    }

    /** The site's changes, newest first (at most 500). */
    @Operation(summary = "The site's history", description = "Who changed what and when, newest first, at most 500")
    @ApiResponse(responseCode = "200", description = "The changes")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping("/audit")
    public List<AuditEvent> audit(@PathVariable long siteId) {
        sites.get(siteId);
        return audit.forSite(siteId, 500);
    }
}

package org.lpzplanner.system;

import java.net.URI;
import org.springframework.http.HttpStatus;
import org.springframework.http.HttpStatusCode;
import org.springframework.http.MediaType;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;

/**
 * The kinds of problem the JSON API answers with, each a problem type of RFC 9457 with a URI of
 * ours ({@link #TYPE_PREFIX} and the kind's name; identifiers, not addresses to open) and a title.
 * Every error answer is a problem detail of content type {@code application/problem+json} with
 * {@code type}, {@code title}, {@code status}, {@code detail} (what is wrong and what to do, fit to
 * show to users), {@code instance} (the request's path) and {@code error}, the same text as
 * {@code detail} for clients of earlier releases; members such as {@code field} name where.
 */
public enum ApiProblem {

    /** A value of the request cannot be used; {@code field} names it. */
    INVALID_INPUT("invalid-input", "Invalid input", HttpStatus.BAD_REQUEST),
    /**
     * The request body cannot be read: empty, not JSON (RFC 8259), not UTF-8, a member twice, nested
     * too deep, a number too long, or an unreadable multipart form; {@code field} names the member
     * where it is known.
     */
    UNREADABLE_BODY("unreadable-body", "Unreadable request body", HttpStatus.BAD_REQUEST),
    /**
     * The site file is not a valid site: {@code file}, {@code feature}, {@code featureName},
     * {@code line}, {@code field} and {@code problem} say where and what.
     */
    INVALID_SITE_FILE("invalid-site-file", "Invalid site file", HttpStatus.BAD_REQUEST),
    /** The analysis would need too many grid cells; {@code suggestedResolution} fits. */
    ANALYSIS_TOO_LARGE("analysis-too-large", "Analysis too large", HttpStatus.BAD_REQUEST),
    /** No account: sign in, or send a personal API token. */
    UNAUTHORIZED("unauthorized", "Not signed in", HttpStatus.UNAUTHORIZED),
    /** The account may not do this, or the request lacks its CSRF token. */
    FORBIDDEN("forbidden", "Not allowed", HttpStatus.FORBIDDEN),
    /** What the address or a value names is not stored for the account's team. */
    NOT_FOUND("not-found", "Not found", HttpStatus.NOT_FOUND),
    /** The site was changed meanwhile (a stale {@code version}), or its state does not allow this. */
    CONFLICT("conflict", "Conflict", HttpStatus.CONFLICT),
    /** The upload or the JSON body is larger than its limit; {@code field} is {@code file} or {@code body}. */
    TOO_LARGE("too-large", "Request too large", HttpStatus.CONTENT_TOO_LARGE),
    /** Every worker is busy; try again after {@code retryAfterSeconds} (also the Retry-After header). */
    BUSY("busy", "Busy", HttpStatus.TOO_MANY_REQUESTS),
    /**
     * A long computation ran past its time budget and was stopped; nothing was stored. Try again after
     * {@code retryAfterSeconds} (also the Retry-After header).
     */
    OVER_BUDGET("over-budget", "Time budget passed", HttpStatus.SERVICE_UNAVAILABLE),
    /**
     * The request does not fit the endpoint (wrong method, media type or a missing parameter); the
     * status says which.
     */
    REQUEST_NOT_HANDLED("request-not-handled", "Request not handled", HttpStatus.BAD_REQUEST),
    /** The server failed; nothing of the request was completed. */
    SERVER_ERROR("server-error", "Server error", HttpStatus.INTERNAL_SERVER_ERROR);

    /** Every problem type starts with this; the kind's name follows. */
    public static final String TYPE_PREFIX = "urn:lpz-planner:problem:";

    private final String name;
    private final String title;
    private final HttpStatus status;

    ApiProblem(String name, String title, HttpStatus status) {
        this.name = name;
        this.title = title;
        this.status = status;
    }

    /** The problem type, e.g. {@code urn:lpz-planner:problem:invalid-input}. */
    public URI type() {
        return URI.create(TYPE_PREFIX + name);
    }

    public String title() {
        return title;
    }

    /** The status answered, unless the case gives its own ({@link #REQUEST_NOT_HANDLED}). */
    public HttpStatus status() {
        return status;
    }

    /** A problem of this kind and its own status saying {@code detail}; members may be added. */
    public ProblemDetail with(String detail) {
        return with(status, detail);
    }

    /** A problem of this kind with the given status, saying {@code detail}. */
    public ProblemDetail with(HttpStatusCode status, String detail) {
        ProblemDetail problem = ProblemDetail.forStatusAndDetail(status, detail);
        problem.setType(type());
        problem.setTitle(title);
        problem.setProperty("error", detail);
        return problem;
    }

    /** The answer carrying {@code problem}, as {@code application/problem+json}. */
    public static ResponseEntity<ProblemDetail> answer(ProblemDetail problem) {
        return ResponseEntity.status(problem.getStatus()).contentType(MediaType.APPLICATION_PROBLEM_JSON)
                .body(problem);
    }
}

package org.lpzplanner.system;

import java.util.LinkedHashMap;
import java.util.Map;
import org.lpzplanner.engine.envelope.AnalysisTooLargeException;
import org.lpzplanner.engine.io.SiteFormatException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.dao.DuplicateKeyException;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.http.HttpStatus;
import org.springframework.http.HttpStatusCode;
import org.springframework.http.ResponseEntity;
import org.springframework.web.ErrorResponse;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.bind.annotation.RestControllerAdvice;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import org.springframework.web.multipart.MaxUploadSizeExceededException;
import org.springframework.web.multipart.MultipartException;

/**
 * Turns every failure of the JSON API into a JSON body {@code {"error": "..."}} with a fitting
 * status, never a stack trace: 400 for unusable input (site files also name {@code file},
 * {@code feature}, {@code featureName}, {@code line} and {@code field} where known), 404 for anything
 * not stored ({@link NotFoundException}), 409 for concurrent changes and {@link ConflictException}s,
 * 429 with {@code Retry-After} when the workers are all busy ({@link BusyException}), 413 for oversized
 * uploads, 500 with a plain message otherwise. It knows the features only through these base types.
 */
@RestControllerAdvice(annotations = RestController.class)
public class ApiErrorHandler {

    private static final Logger LOG = LoggerFactory.getLogger(ApiErrorHandler.class);

    private final UploadLimit uploadLimit;

    public ApiErrorHandler(UploadLimit uploadLimit) {
        this.uploadLimit = uploadLimit;
    }

    @ExceptionHandler(SiteFormatException.class)
    ResponseEntity<Map<String, Object>> siteFormat(SiteFormatException e) {
        Map<String, Object> body = error(e.getMessage());
        body.put("file", e.source());
        body.put("feature", e.featureIndex());
        body.put("featureName", e.featureName());
        body.put("line", e.line());
        body.put("field", e.field());
        body.put("problem", e.problem());
        return ResponseEntity.badRequest().body(body);
    }

    @ExceptionHandler(AnalysisTooLargeException.class)
    ResponseEntity<Map<String, Object>> tooLarge(AnalysisTooLargeException e) {
        Map<String, Object> body = error(e.getMessage());
        body.put("field", "resolution");
        body.put("suggestedResolution", e.suggestedResolution());
        return ResponseEntity.badRequest().body(body);
    }

    @ExceptionHandler(InvalidInputException.class)
    ResponseEntity<Map<String, Object>> invalid(InvalidInputException e) {
        Map<String, Object> body = error(e.getMessage());
        body.put("field", e.field());
        return ResponseEntity.badRequest().body(body);
    }

    @ExceptionHandler(NotFoundException.class)
    ResponseEntity<Map<String, Object>> notFound(NotFoundException e) {
        Map<String, Object> body = error(e.getMessage());
        if (e.field() != null) {
            body.put("field", e.field());
        }
        return ResponseEntity.status(HttpStatus.NOT_FOUND).body(body);
    }

    @ExceptionHandler(BusyException.class)
    ResponseEntity<Map<String, Object>> busy(BusyException e) {
        Map<String, Object> body = error(e.getMessage());
        body.put("retryAfterSeconds", e.retryAfterSeconds());
        return ResponseEntity.status(HttpStatus.TOO_MANY_REQUESTS)
                .header("Retry-After", Integer.toString(e.retryAfterSeconds())).body(body);
    }

    @ExceptionHandler(ConflictException.class)
    ResponseEntity<Map<String, Object>> stateConflict(ConflictException e) {
        Map<String, Object> body = error(e.getMessage());
        if (e.field() != null) {
            body.put("field", e.field());
        }
        return ResponseEntity.status(HttpStatus.CONFLICT).body(body);
    }

    @ExceptionHandler(MethodArgumentTypeMismatchException.class)
    ResponseEntity<Map<String, Object>> typeMismatch(MethodArgumentTypeMismatchException e) {
        return ResponseEntity.badRequest().body(error(e.getName() + " must be a whole number, got \""
                + e.getValue() + "\""));
    }

    @ExceptionHandler(MaxUploadSizeExceededException.class)
    ResponseEntity<Map<String, Object>> tooLarge(MaxUploadSizeExceededException e) {
        Map<String, Object> body = error(uploadLimit.message());
        body.put("field", "file");
        return ResponseEntity.status(HttpStatus.CONTENT_TOO_LARGE).body(body);
    }

    @ExceptionHandler(MultipartException.class)
    ResponseEntity<Map<String, Object>> multipart(MultipartException e) {
        return ResponseEntity.badRequest().body(error("the upload could not be read as a multipart form"));
    }

    /**
     * A stale version, or two saves of one site racing for the same revision or file number (the
     * database's unique constraints let only the first one in, also across app instances).
     */
    @ExceptionHandler({OptimisticLockingFailureException.class, DuplicateKeyException.class})
    ResponseEntity<Map<String, Object>> conflict(RuntimeException e) {
        return ResponseEntity.status(HttpStatus.CONFLICT).body(error(
                "the site was changed or removed meanwhile; reload it and try again"));
    }

    /** A request that reached a service without a team to act for (never a normal signed-in one). */
    @ExceptionHandler(org.springframework.security.access.AccessDeniedException.class)
    ResponseEntity<Map<String, Object>> denied(org.springframework.security.access.AccessDeniedException e) {
        return ResponseEntity.status(HttpStatus.FORBIDDEN).body(error("you may not do this; sign in first"));
    }

    /** Spring's own request errors (missing parameter, wrong method, …) keep their status. */
    @ExceptionHandler(Exception.class)
    ResponseEntity<Map<String, Object>> other(Exception e) {
        if (e instanceof ErrorResponse response) {
            HttpStatusCode status = response.getStatusCode();
            String detail = response.getBody().getDetail();
            return ResponseEntity.status(status).body(error(detail == null ? "the request cannot be handled" : detail));
        }
        LOG.error("Unexpected failure of an API request", e);
        return ResponseEntity.status(HttpStatus.INTERNAL_SERVER_ERROR).body(error(
                "something went wrong on the server; the request was not completed"));
    }

    private static Map<String, Object> error(String message) {
        Map<String, Object> body = new LinkedHashMap<>();
        body.put("error", message);
        return body;
    }
}

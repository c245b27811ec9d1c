package org.lpzplanner.system;

import jakarta.servlet.http.HttpServletRequest;
import java.lang.reflect.RecordComponent;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import org.lpzplanner.engine.envelope.AnalysisTooLargeException;
import org.lpzplanner.engine.io.SiteFormatException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.dao.DuplicateKeyException;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.http.converter.HttpMessageNotReadableException;
import org.springframework.validation.FieldError;
import org.springframework.validation.ObjectError;
import org.springframework.web.ErrorResponse;
import org.springframework.web.bind.MethodArgumentNotValidException;
import org.springframework.web.bind.MissingServletRequestParameterException;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.bind.annotation.RestControllerAdvice;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import org.springframework.web.multipart.MaxUploadSizeExceededException;
import org.springframework.web.multipart.MultipartException;

/**
 * Turns every failure of the JSON API into a problem detail (RFC 9457, {@link ApiProblem}: type,
 * title, status, detail and the same text as {@code error}), never a stack trace: 400 for unusable
 * input naming the {@code field} (site files also name {@code file}, {@code feature},
 * {@code featureName}, {@code line} and {@code problem}; a grid too large gives
 * {@code suggestedResolution}), 400 for a body that is not readable JSON, 404 for anything not stored
 * ({@link NotFoundException}), 409 for concurrent changes and {@link ConflictException}s, 413 for
 * oversized uploads and JSON bodies, 429 with {@code Retry-After} and {@code retryAfterSeconds} when
 * the workers are all busy ({@link BusyException}), 503 with {@code Retry-After} and
 * {@code retryAfterSeconds} when a computation ran past its time budget ({@link OverBudgetException}), 500 with a plain message otherwise. It knows the
 * features only through these base types.
 */
@RestControllerAdvice(annotations = RestController.class)
public class ApiErrorHandler {

    private static final Logger LOG = LoggerFactory.getLogger(ApiErrorHandler.class);

    private final UploadLimit uploadLimit;

    public ApiErrorHandler(UploadLimit uploadLimit) {
        this.uploadLimit = uploadLimit;
    }

    @ExceptionHandler(SiteFormatException.class)
    ResponseEntity<ProblemDetail> siteFormat(SiteFormatException e) {
        ProblemDetail problem = ApiProblem.INVALID_SITE_FILE.with(e.getMessage());
        problem.setProperty("file", e.source());
        problem.setProperty("feature", e.featureIndex());
        problem.setProperty("featureName", e.featureName());
        problem.setProperty("line", e.line());
        problem.setProperty("field", e.field());
        problem.setProperty("problem", e.problem());
        return ApiProblem.answer(problem);
    }

    @ExceptionHandler(AnalysisTooLargeException.class)
    ResponseEntity<ProblemDetail> tooLarge(AnalysisTooLargeException e) {
        ProblemDetail problem = ApiProblem.ANALYSIS_TOO_LARGE.with(e.getMessage());
        problem.setProperty("field", "resolution");
        problem.setProperty("suggestedResolution", e.suggestedResolution());
        return ApiProblem.answer(problem);
    }

    @ExceptionHandler(InvalidInputException.class)
    ResponseEntity<ProblemDetail> invalid(InvalidInputException e) {
        return answer(ApiProblem.INVALID_INPUT.with(e.getMessage()), e.field());
    }

    /** A request record that breaks a constraint: the first broken member in the record's order. */
    @ExceptionHandler(MethodArgumentNotValidException.class)
    ResponseEntity<ProblemDetail> notValid(MethodArgumentNotValidException e) {
        List<RecordComponent> order = e.getParameter().getParameterType().isRecord()
                ? Arrays.asList(e.getParameter().getParameterType().getRecordComponents()) : List.of();
        ObjectError first = e.getBindingResult().getAllErrors().stream()
                .min(Comparator.comparingInt((ObjectError error) -> position(order, error))
                        .thenComparing(error -> error instanceof FieldError f ? f.getField() : ""))
                .orElseThrow();
        if (first instanceof FieldError f) {
            return answer(ApiProblem.INVALID_INPUT.with(f.getField() + " " + f.getDefaultMessage()), f.getField());
        }
        return answer(ApiProblem.INVALID_INPUT.with(String.valueOf(first.getDefaultMessage())), "body");
    }

    private static int position(List<RecordComponent> order, ObjectError error) {
        if (!(error instanceof FieldError f)) {
            return Integer.MAX_VALUE;
        }
        String member = JsonPaths.outermost(f.getField());
        for (int i = 0; i < order.size(); i++) {
            if (order.get(i).getName().equals(member)) {
                return i;
            }
        }
        return order.size();
    }

    /** A body that is not JSON, or not the JSON object the endpoint takes; one WARN line, no stack trace. */
    @ExceptionHandler(HttpMessageNotReadableException.class)
    ResponseEntity<ProblemDetail> unreadable(HttpMessageNotReadableException e, HttpServletRequest request) {
        JsonBodyErrors.Described d = JsonBodyErrors.describe(e, (byte[]) request.getAttribute(JsonBodyLimit.BODY));
        if (d.kind() == ApiProblem.UNREADABLE_BODY) {
            LOG.warn("Unreadable JSON body of {} {}: {}", request.getMethod(), request.getRequestURI(), d.detail());
        }
        return answer(d.kind().with(d.detail()), d.field());
    }

    @ExceptionHandler(JsonBodyTooLargeException.class)
    ResponseEntity<ProblemDetail> bodyTooLarge(JsonBodyTooLargeException e, HttpServletRequest request) {
        LOG.warn("JSON body of {} {} refused: {}", request.getMethod(), request.getRequestURI(), e.getMessage());
        return answer(ApiProblem.TOO_LARGE.with(e.getMessage()), "body");
    }

    @ExceptionHandler(NotFoundException.class)
    ResponseEntity<ProblemDetail> notFound(NotFoundException e) {
        return answer(ApiProblem.NOT_FOUND.with(e.getMessage()), e.field());
    }

    @ExceptionHandler(BusyException.class)
    ResponseEntity<ProblemDetail> busy(BusyException e) {
        ProblemDetail problem = ApiProblem.BUSY.with(e.getMessage());
        problem.setProperty("retryAfterSeconds", e.retryAfterSeconds());
        return ResponseEntity.status(problem.getStatus()).header("Retry-After", Integer.toString(e.retryAfterSeconds()))
                .contentType(org.springframework.http.MediaType.APPLICATION_PROBLEM_JSON).body(problem);
    }

    @ExceptionHandler(OverBudgetException.class)
    ResponseEntity<ProblemDetail> overBudget(OverBudgetException e) {
        ProblemDetail problem = ApiProblem.OVER_BUDGET.with(e.getMessage());
        problem.setProperty("retryAfterSeconds", e.retryAfterSeconds());
        return ResponseEntity.status(problem.getStatus()).header("Retry-After", Integer.toString(e.retryAfterSeconds()))
                .contentType(org.springframework.http.MediaType.APPLICATION_PROBLEM_JSON).body(problem);
    }

    @ExceptionHandler(ConflictException.class)
    ResponseEntity<ProblemDetail> stateConflict(ConflictException e) {
        return answer(ApiProblem.CONFLICT.with(e.getMessage()), e.field());
    }

    @ExceptionHandler(MethodArgumentTypeMismatchException.class)
    ResponseEntity<ProblemDetail> typeMismatch(MethodArgumentTypeMismatchException e) {
        return answer(ApiProblem.INVALID_INPUT.with(e.getName() + " must be a whole number, got \"" + e.getValue()
                + "\""), e.getName());
    }

    @ExceptionHandler(MissingServletRequestParameterException.class)
    ResponseEntity<ProblemDetail> missingParameter(MissingServletRequestParameterException e) {
        return answer(ApiProblem.INVALID_INPUT.with("parameter " + e.getParameterName() + " is required"),
                e.getParameterName());
    }

    @ExceptionHandler(MaxUploadSizeExceededException.class)
    ResponseEntity<ProblemDetail> tooLarge(MaxUploadSizeExceededException e) {
        return answer(ApiProblem.TOO_LARGE.with(uploadLimit.message()), "file");
    }

    @ExceptionHandler(MultipartException.class)
    ResponseEntity<ProblemDetail> multipart(MultipartException e) {
        return answer(ApiProblem.UNREADABLE_BODY.with("the upload could not be read as a multipart form"), null);
    }

    /**
     * A stale version, or two saves of one site racing for the same revision or file number (the
     * database's unique constraints let only the first one in, also across app instances).
     */
    @ExceptionHandler({OptimisticLockingFailureException.class, DuplicateKeyException.class})
    ResponseEntity<ProblemDetail> conflict(RuntimeException e) {
        return answer(ApiProblem.CONFLICT.with("the site was changed or removed meanwhile; reload it and try again"),
                null);
    }

    /** A request that reached a service without a team to act for (never a normal signed-in one). */
    @ExceptionHandler(org.springframework.security.access.AccessDeniedException.class)
    ResponseEntity<ProblemDetail> denied(org.springframework.security.access.AccessDeniedException e) {
        return answer(ApiProblem.FORBIDDEN.with("you may not do this; sign in first"), null);
    }

    /** Spring's own request errors (wrong method, media type, …) keep their status. */
    @ExceptionHandler(Exception.class)
    ResponseEntity<ProblemDetail> other(Exception e) {
        if (e instanceof ErrorResponse response) {
            return ApiRouteErrors.notHandled(response);
        }
        if (clientWentAway(e)) {
            // the client closed the connection before the answer was written: nothing failed here,
            // and there is no one left to answer
            LOG.info("Client went away before its answer was written: {}", e.getMessage());
            return null;
        }
        LOG.error("Unexpected failure of an API request", e);
        return answer(ApiProblem.SERVER_ERROR.with("something went wrong on the server; the request was not"
                + " completed"), null);
    }

    /**
     * Whether the failure is the client closing the connection (the servlet container's abort, a
     * broken pipe or a reset while writing), found anywhere in the cause chain.
     */
    static boolean clientWentAway(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause() == t ? null : t.getCause()) {
            if (t instanceof org.springframework.web.context.request.async.AsyncRequestNotUsableException
                    || t.getClass().getSimpleName().equals("ClientAbortException")) {
                return true;
            }
            if (t instanceof java.io.IOException && t.getMessage() != null
                    && (t.getMessage().contains("Broken pipe") || t.getMessage().contains("Connection reset"))) {
                return true;
            }
        }
        return false;
    }

    private static ResponseEntity<ProblemDetail> answer(ProblemDetail problem, String field) {
        if (field != null) {
            problem.setProperty("field", field);
        }
        return ApiProblem.answer(problem);
    }
}

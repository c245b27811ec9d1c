package org.lpzplanner.system;

import jakarta.servlet.http.HttpServletRequest;
import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.web.ErrorResponse;
import org.springframework.web.HttpMediaTypeNotAcceptableException;
import org.springframework.web.HttpMediaTypeNotSupportedException;
import org.springframework.web.HttpRequestMethodNotSupportedException;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.RestControllerAdvice;

/**
 * An API address asked with a method or media type none of its operations takes: no controller is
 * chosen then, so {@link ApiErrorHandler} does not apply; this answers those with the same problem
 * details, keeping the status (405, 415, 406). Requests outside {@code /api/} are left to the error
 * page.
 */
@RestControllerAdvice
@Order(Ordered.LOWEST_PRECEDENCE)
public class ApiRouteErrors {

    @ExceptionHandler({HttpRequestMethodNotSupportedException.class, HttpMediaTypeNotSupportedException.class,
            HttpMediaTypeNotAcceptableException.class})
    ResponseEntity<ProblemDetail> route(Exception e, HttpServletRequest request) throws Exception {
        if (!request.getRequestURI().startsWith(request.getContextPath() + "/api/")) {
            throw e;
        }
        return notHandled((ErrorResponse) e);
    }

    /** Spring's own refusal of a request, with its status and its words. */
    static ResponseEntity<ProblemDetail> notHandled(ErrorResponse response) {
        String detail = response.getBody().getDetail();
        ProblemDetail problem = ApiProblem.REQUEST_NOT_HANDLED.with(response.getStatusCode(),
                detail == null ? "the request cannot be handled" : detail);
        ResponseEntity.BodyBuilder answer = ResponseEntity.status(response.getStatusCode())
                .contentType(org.springframework.http.MediaType.APPLICATION_PROBLEM_JSON);
        response.getHeaders().forEach((name, values) -> answer.header(name, values.toArray(String[]::new)));
        return answer.body(problem);
    }
}

package org.lpzplanner.system;

import jakarta.servlet.http.HttpServletResponse;
import org.lpzplanner.engine.envelope.AnalysisTooLargeException;
import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import org.springframework.web.multipart.MaxUploadSizeExceededException;
import org.springframework.web.servlet.ModelAndView;

/**
 * Failures of the pages marked {@link SitePages}, shown as pages: anything not stored gives a 404
 * page with the reason, unusable input or an analysis too large to run a 400 page with the reason,
 * busy workers a 429 page with {@code Retry-After}, a computation stopped after its time budget a
 * 503 page with {@code Retry-After}, an upload over the size limit the 413 page
 * saying the limit. A feature may answer its own not-found cases first with an advice of higher
 * precedence (a site that does not exist has a page of its own).
 */
@ControllerAdvice(annotations = SitePages.class)
@Order(Ordered.LOWEST_PRECEDENCE)
public class PageErrors {

    private final UploadLimit uploadLimit;

    public PageErrors(UploadLimit uploadLimit) {
        this.uploadLimit = uploadLimit;
    }

    @ExceptionHandler(NotFoundException.class)
    ModelAndView notFound(NotFoundException e) {
        return reasonPage(HttpStatus.NOT_FOUND, e.getMessage());
    }

    @ExceptionHandler(MethodArgumentTypeMismatchException.class)
    ModelAndView badNumber(MethodArgumentTypeMismatchException e) {
        return reasonPage(HttpStatus.BAD_REQUEST, e.getName() + " must be a whole number, got \"" + e.getValue() + "\"");
    }

    @ExceptionHandler(BusyException.class)
    ModelAndView busy(BusyException e, HttpServletResponse response) {
        response.setHeader("Retry-After", Integer.toString(e.retryAfterSeconds()));
        return reasonPage(HttpStatus.TOO_MANY_REQUESTS, e.getMessage());
    }

    @ExceptionHandler(OverBudgetException.class)
    ModelAndView overBudget(OverBudgetException e, HttpServletResponse response) {
        response.setHeader("Retry-After", Integer.toString(e.retryAfterSeconds()));
        return reasonPage(HttpStatus.SERVICE_UNAVAILABLE, e.getMessage());
    }

    @ExceptionHandler(ConflictException.class)
    ModelAndView conflict(ConflictException e) {
        return reasonPage(HttpStatus.CONFLICT, e.getMessage());
    }

    @ExceptionHandler(AnalysisTooLargeException.class)
    ModelAndView tooLarge(AnalysisTooLargeException e) {
        return reasonPage(HttpStatus.BAD_REQUEST, e.getMessage());
    }

    @ExceptionHandler(MaxUploadSizeExceededException.class)
    ModelAndView uploadTooLarge(MaxUploadSizeExceededException e) {
        return uploadLimit.refusedPage();
    }

    @ExceptionHandler(InvalidInputException.class)
    ModelAndView invalid(InvalidInputException e) {
        return reasonPage(HttpStatus.BAD_REQUEST, e.getMessage());
    }

    /** The page saying why a request could not be done. */
    public static ModelAndView reasonPage(HttpStatus status, String reason) {
        ModelAndView page = new ModelAndView("system/reason", status);
        page.addObject("reason", reason);
        return page;
    }
}

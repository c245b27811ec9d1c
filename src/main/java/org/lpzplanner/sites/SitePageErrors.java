package org.lpzplanner.sites;

import org.lpzplanner.analysis.ReviewItemNotFoundException;
import org.lpzplanner.comments.CommentPageController;
import org.lpzplanner.engine.envelope.AnalysisTooLargeException;
import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.UploadLimit;
import jakarta.servlet.http.HttpServletResponse;
import org.lpzplanner.analysis.AnalysisBusyException;
import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import org.springframework.web.multipart.MaxUploadSizeExceededException;
import org.springframework.web.servlet.ModelAndView;

/**
 * Errors of the site pages shown as pages: an unknown site (or an id that is not a number) gives a
 * 404 page saying so; an unusable analysis setting, or an analysis too large to run, gives a 400
 * page with the reason; an unknown review item gives a 404 page with the reason; an upload over the
 * size limit gives a 413 page saying the limit.
 */
@ControllerAdvice(assignableTypes = {SitePageController.class, SiteActionsPageController.class,
    ReviewPageController.class, SectionPageController.class, CommentPageController.class,
    org.lpzplanner.report.ReportPageController.class, org.lpzplanner.design.DesignPageController.class})
public class SitePageErrors {

    private final UploadLimit uploadLimit;

    public SitePageErrors(UploadLimit uploadLimit) {
        this.uploadLimit = uploadLimit;
    }

    @ExceptionHandler(SiteNotFoundException.class)
    ModelAndView notFound(SiteNotFoundException e) {
        return notFoundPage(String.valueOf(e.siteId()));
    }

    @ExceptionHandler(MethodArgumentTypeMismatchException.class)
    ModelAndView badId(MethodArgumentTypeMismatchException e) {
        if (!"id".equals(e.getName())) {
            return reasonPage(HttpStatus.BAD_REQUEST, e.getName() + " must be a whole number, got \"" + e.getValue() + "\"");
        }
        return notFoundPage(String.valueOf(e.getValue()));
    }

    @ExceptionHandler(ReviewItemNotFoundException.class)
    ModelAndView noItem(ReviewItemNotFoundException e) {
        return reasonPage(HttpStatus.NOT_FOUND, e.getMessage());
    }

    @ExceptionHandler(AnalysisBusyException.class)
    ModelAndView busy(AnalysisBusyException e, HttpServletResponse response) {
        response.setHeader("Retry-After", Integer.toString(e.retryAfterSeconds()));
        return reasonPage(HttpStatus.TOO_MANY_REQUESTS, e.getMessage());
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

    private static ModelAndView notFoundPage(String siteId) {
        ModelAndView page = new ModelAndView("sites/not-found", HttpStatus.NOT_FOUND);
        page.addObject("siteId", siteId);
        return page;
    }

    /** The page saying why a request could not be done. */
    private static ModelAndView reasonPage(HttpStatus status, String reason) {
        ModelAndView page = new ModelAndView("sites/invalid", status);
        page.addObject("reason", reason);
        return page;
    }
}

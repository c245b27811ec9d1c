package org.lpzplanner.transfer;

import jakarta.servlet.http.HttpServletResponse;
import org.lpzplanner.system.BusyException;
import org.lpzplanner.system.UploadLimit;
import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.multipart.MaxUploadSizeExceededException;
import org.springframework.web.servlet.ModelAndView;

/**
 * An import over the upload size limit gives a 413 page saying the limit; one that finds every
 * analysis place taken while computing its revisions' results gives a 429 page saying to try again.
 */
@ControllerAdvice(assignableTypes = SiteTransferPageController.class)
public class SiteTransferPageErrors {

    private final UploadLimit uploadLimit;

    public SiteTransferPageErrors(UploadLimit uploadLimit) {
        this.uploadLimit = uploadLimit;
    }

    @ExceptionHandler(MaxUploadSizeExceededException.class)
    ModelAndView tooLarge(MaxUploadSizeExceededException e) {
        return uploadLimit.refusedPage();
    }

    @ExceptionHandler(BusyException.class)
    ModelAndView busy(BusyException e, HttpServletResponse response) {
        response.setHeader("Retry-After", Integer.toString(e.retryAfterSeconds()));
        ModelAndView page = new ModelAndView("sites/import-failed", HttpStatus.TOO_MANY_REQUESTS);
        page.addObject("reason", e.getMessage());
        return page;
    }
}

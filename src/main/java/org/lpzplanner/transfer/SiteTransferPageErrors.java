package org.lpzplanner.transfer;

import org.lpzplanner.system.UploadLimit;
import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.multipart.MaxUploadSizeExceededException;
import org.springframework.web.servlet.ModelAndView;

/** An import over the upload size limit gives a 413 page saying the limit. */
@ControllerAdvice(assignableTypes = SiteTransferPageController.class)
public class SiteTransferPageErrors {

    private final UploadLimit uploadLimit;

    public SiteTransferPageErrors(UploadLimit uploadLimit) {
        this.uploadLimit = uploadLimit;
    }

    @ExceptionHandler(MaxUploadSizeExceededException.class)
    ModelAndView tooLarge(MaxUploadSizeExceededException e) {
        ModelAndView page = new ModelAndView("sites/upload-refused", HttpStatus.CONTENT_TOO_LARGE);
        page.addObject("reason", uploadLimit.message());
        return page;
    }
}

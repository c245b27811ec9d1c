package org.lpzplanner.transfer;

import org.lpzplanner.system.UploadLimit;
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
        return uploadLimit.refusedPage();
    }
}

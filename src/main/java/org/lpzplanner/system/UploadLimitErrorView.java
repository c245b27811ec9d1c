package org.lpzplanner.system;

import jakarta.servlet.http.HttpServletRequest;
import java.util.Map;
import org.springframework.boot.webmvc.autoconfigure.error.ErrorViewResolver;
import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Component;
import org.springframework.web.servlet.ModelAndView;

/**
 * A browser upload over the size limit can fail before any controller sees it: the sign-in checks
 * read the form's parameters and the container refuses the oversized body right there. The error
 * page for that answer then says the limit, like the upload pages do, instead of a generic error.
 */
@Component
@Order(Ordered.HIGHEST_PRECEDENCE)
public class UploadLimitErrorView implements ErrorViewResolver {

    private final UploadLimit uploadLimit;

    public UploadLimitErrorView(UploadLimit uploadLimit) {
        this.uploadLimit = uploadLimit;
    }

    @Override
    public ModelAndView resolveErrorView(HttpServletRequest request, HttpStatus status, Map<String, Object> model) {
        if (status != HttpStatus.CONTENT_TOO_LARGE) {
            return null;
        }
        return uploadLimit.refusedPage();
    }
}

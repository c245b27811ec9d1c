package org.lpzplanner.sites;

import org.lpzplanner.system.PageErrors;
import org.lpzplanner.system.SitePages;
import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import org.springframework.web.servlet.ModelAndView;

/**
 * On the site pages, a site that is not stored (or a site id that is not a number) gives the page
 * saying that no such site exists, with the id asked for; before the general page errors.
 */
@ControllerAdvice(annotations = SitePages.class)
@Order(Ordered.HIGHEST_PRECEDENCE)
public class SiteNotFoundPage {

    @ExceptionHandler(SiteNotFoundException.class)
    ModelAndView notFound(SiteNotFoundException e) {
        return page(String.valueOf(e.siteId()));
    }

    @ExceptionHandler(MethodArgumentTypeMismatchException.class)
    ModelAndView badId(MethodArgumentTypeMismatchException e) {
        if (!"id".equals(e.getName())) {
            return PageErrors.reasonPage(HttpStatus.BAD_REQUEST,
                    e.getName() + " must be a whole number, got \"" + e.getValue() + "\"");
        }
        return page(String.valueOf(e.getValue()));
    }

    private static ModelAndView page(String siteId) {
        ModelAndView page = new ModelAndView("sites/not-found", HttpStatus.NOT_FOUND);
        page.addObject("siteId", siteId);
        return page;
    }
}

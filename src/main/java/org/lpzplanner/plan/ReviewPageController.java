package org.lpzplanner.plan;

import java.util.Locale;
import org.lpzplanner.analysis.ReviewService;
import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.SitePages;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.ModelAndView;

/**
 * The forms of the review list on the plan page: {@code POST /sites/{id}/accepted} ({@code key},
 * {@code reason}) marks an exposed item accepted, {@code POST /sites/{id}/accepted/remove}
 * ({@code key}) marks it exposed again. A blank reason shows the plan again with the error at the
 * list; nothing is stored then.
 */
@Controller
@SitePages
public class ReviewPageController {

    private final ReviewService reviews;
    private final PlanPage planPage;

    public ReviewPageController(ReviewService reviews, PlanPage planPage) {
        this.reviews = reviews;
        this.planPage = planPage;
    }

    @PostMapping("/sites/{id}/accepted")
    public ModelAndView accept(@PathVariable long id, @RequestParam(required = false) String key,
            @RequestParam(required = false) String reason, Locale locale) {
        try {
            reviews.accept(id, key, reason);
            return new ModelAndView("redirect:/sites/" + id + "#review");
        } catch (InvalidInputException e) {
            ModelAndView page = new ModelAndView("sites/plan", HttpStatus.BAD_REQUEST);
            page.addAllObjects(planPage.attributes(id, locale));
            page.addObject("reviewError", e.getMessage());
            page.addObject("reviewErrorKey", key);
            return page;
        }
    }

    @PostMapping("/sites/{id}/accepted/remove")
    public ModelAndView remove(@PathVariable long id, @RequestParam(required = false) String key) {
        reviews.remove(id, key);
        return new ModelAndView("redirect:/sites/" + id + "#review");
    }
}

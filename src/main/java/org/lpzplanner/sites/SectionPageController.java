package org.lpzplanner.sites;

import java.util.Locale;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestParam;

/**
 * The section page ({@code /sites/{id}/section?x1=&y1=&x2=&y2=}, local metres): a vertical cut
 * through the site with the structure profile, the protection envelope and the sphere. Without any
 * of the four numbers it shows the cut the plan page suggests; a number that cannot be read, or a
 * cut shorter than 1 m, gives a 400 page naming it.
 */
@Controller
public class SectionPageController {

    private final SectionPage sectionPage;

    SectionPageController(SectionPage sectionPage) {
        this.sectionPage = sectionPage;
    }

    @GetMapping("/sites/{id}/section")
    public String section(@PathVariable long id, @RequestParam(required = false) String x1,
            @RequestParam(required = false) String y1, @RequestParam(required = false) String x2,
            @RequestParam(required = false) String y2, Model model, Locale locale) {
        model.addAllAttributes(sectionPage.attributes(id, new String[] {x1, y1, x2, y2}, locale));
        return "sites/section";
    }
}

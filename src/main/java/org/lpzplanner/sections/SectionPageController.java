package org.lpzplanner.sections;

import java.util.Locale;
import org.lpzplanner.system.SitePages;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.util.UriComponentsBuilder;

/**
 * The section page ({@code /sites/{id}/section?x1=&y1=&x2=&y2=}, local metres): a vertical cut
 * through the site with the structure profile, the protection envelope and the sphere. Without any
 * of the four numbers it shows the cut the plan page suggests; a number that cannot be read, or a
 * cut shorter than 1 m, gives a 400 page naming it. Lists the site's saved cuts; designers save the cut
 * shown under a name ({@code POST /sites/{id}/cuts}) and delete saved ones.
 */
@Controller
@SitePages
public class SectionPageController {

    private final SectionPage sectionPage;
    private final SiteCutService cuts;

    SectionPageController(SectionPage sectionPage, SiteCutService cuts) {
        this.sectionPage = sectionPage;
        this.cuts = cuts;
    }

    @GetMapping("/sites/{id}/section")
    public String section(@PathVariable long id, @RequestParam(required = false) String x1,
            @RequestParam(required = false) String y1, @RequestParam(required = false) String x2,
            @RequestParam(required = false) String y2, Model model, Locale locale) {
        model.addAllAttributes(sectionPage.attributes(id, new String[] {x1, y1, x2, y2}, locale));
        model.addAttribute("savedCuts", cuts.cuts(id));
        return "sites/section";
    }

    /** Saves the cut shown under a name and shows it again (designers and administrators only). */
    @PostMapping("/sites/{id}/cuts")
    public String save(@PathVariable long id, @RequestParam(required = false) String name,
            @RequestParam(required = false) String x1, @RequestParam(required = false) String y1,
            @RequestParam(required = false) String x2, @RequestParam(required = false) String y2) {
        SiteCut cut = cuts.save(id, name, new String[] {x1, y1, x2, y2});
        return "redirect:" + UriComponentsBuilder.fromPath("/sites/{id}/section")
                .queryParam("x1", cut.x1()).queryParam("y1", cut.y1()).queryParam("x2", cut.x2())
                .queryParam("y2", cut.y2()).buildAndExpand(id).toUriString() + "#saved-cuts";
    }

    @PostMapping("/sites/{id}/cuts/{cutId}/delete")
    public String delete(@PathVariable long id, @PathVariable long cutId) {
        cuts.delete(id, cutId);
        return "redirect:/sites/" + id + "/section#saved-cuts";
    }
}

package org.lpzplanner.report;

import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.system.SitePages;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;

/**
 * The print link of the plan page: sends the browser to the PDF of the site's latest revision at the
 * moment of the click, so the link stays right after rods are moved without a page reload.
 */
@Controller
@SitePages
public class ReportPageController {

    private final AnalysisService analyses;

    public ReportPageController(AnalysisService analyses) {
        this.analyses = analyses;
    }

    @GetMapping("/sites/{id}/report")
    public String latest(@PathVariable long id) {
        int revision = analyses.latest(id).orElseThrow(() -> new SiteNotFoundException(id,
                "site " + id + " has not been analysed yet, so there is nothing to print")).revision();
        return "redirect:/api/sites/" + id + "/revisions/" + revision + "/report";
    }
}

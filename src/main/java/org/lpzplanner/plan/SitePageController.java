package org.lpzplanner.plan;

import java.io.IOException;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.common.Formats;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.editing.EditPipeline;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.SitePages;
import org.springframework.context.MessageSource;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.multipart.MultipartFile;
import org.springframework.web.servlet.ModelAndView;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/**
 * The server-rendered pages: the site list with the upload form ({@code /}) and the site plan
 * ({@code /sites/{id}}). Uploading a site stores it and analyses it at once ({@link EditPipeline}; when
 * the analysis cannot run now, the plan page says it is pending and why); a bad file is reported on
 * the list page and nothing is stored.
 */
@Controller
@SitePages
public class SitePageController {


    private final SiteService sites;
    private final AnalysisService analyses;
    private final EditPipeline edits;
    private final MessageSource messages;
    private final PlanPage planPage;

    public SitePageController(SiteService sites, AnalysisService analyses, EditPipeline edits,
            MessageSource messages, PlanPage planPage) {
        this.sites = sites;
        this.analyses = analyses;
        this.edits = edits;
        this.messages = messages;
        this.planPage = planPage;
    }

    /** One line of the site list; {@code status} is the exposure at a glance, already worded. */
    public record SiteRow(long id, String name, String level, String lastChange, String status, boolean exposed,
            long version) {
    }

    @GetMapping("/")
    public String list(Model model, Locale locale) {
        model.addAttribute("rows", rows(locale));
        model.addAttribute("levels", ProtectionLevel.values());
        model.addAttribute("defaultLevel", ProtectionLevel.II.name());
        return "sites/list";
    }

    /** The address the upload form posts to, asked for as a page (a bookmark, a reload): the site list. */
    @GetMapping("/sites")
    public String sitesAddress() {
        return "redirect:/";
    }

    @PostMapping("/sites")
    public ModelAndView upload(@RequestParam(value = "file", required = false) MultipartFile file,
            @RequestParam(required = false) String name, @RequestParam(required = false) String level,
            Locale locale, RedirectAttributes redirect) throws IOException {
        try {
            String fileName = file == null ? null : file.getOriginalFilename();
            byte[] bytes = file == null ? new byte[0] : file.getBytes();
            Edit<StoredSite> upload = edits.upload(fileName, bytes, name, level, null);
            PlanPage.notePending(upload, redirect);
            return new ModelAndView("redirect:/sites/" + upload.siteId());
        } catch (SiteFormatException | InvalidInputException e) {
            ModelAndView page = new ModelAndView("sites/list", HttpStatus.BAD_REQUEST);
            page.addObject("rows", rows(locale));
            page.addObject("levels", ProtectionLevel.values());
            page.addObject("defaultLevel", level == null || level.isBlank() ? ProtectionLevel.II.name() : level);
            page.addObject("uploadError", e.getMessage());
            page.addObject("enteredName", name);
            return page;
        }
    }

    @GetMapping("/sites/{id}")
    public String plan(@PathVariable long id, Model model, Locale locale) {
        model.addAllAttributes(planPage.attributes(id, locale));
        return "sites/plan";
    }

    /** Runs a new analysis from the plan page and shows its result. */
    @PostMapping("/sites/{id}/analyses")
    public String analyse(@PathVariable long id, @RequestParam(required = false) String level,
            @RequestParam(required = false) String radius) {
        analyses.run(id, level, radius, null);
        return "redirect:/sites/" + id;
    }

    private List<SiteRow> rows(Locale locale) {
        Map<Long, AnalysisRevision> latest = analyses.latestSummaries();
        return sites.list().stream().map(s -> {
            AnalysisRevision r = latest.get(s.id());
            String status;
            boolean exposed = false;
            if (r == null) {
                status = messages.getMessage("sites.status.notAnalysed", null, locale);
            } else if (r.fullyProtected()) {
                status = messages.getMessage("sites.status.none", null, locale);
            } else if (r.exposedRoofArea() == 0 && r.exposedEdgeLength() == 0 && r.exposedCorners() == 0
                    && r.facadeBands() == 0) {
                // nothing counted as exposed, yet no verdict: a model warning or another item stands
                exposed = true;
                status = messages.getMessage("sites.status.otherItems", null, locale);
            } else {
                exposed = true;
                status = messages.getMessage("sites.status.exposed", new Object[] {Formats.oneDecimal(r.exposedRoofArea()),
                    Formats.oneDecimal(r.exposedEdgeLength()), r.exposedCorners(), r.facadeBands()}, locale);
            }
            return new SiteRow(s.id(), s.name(), r == null ? s.level().name() : r.level().name(),
                    Formats.dateTime(latestOf(s.updatedAt(), r)), status, exposed, s.version());
        }).toList();
    }

    private static Instant latestOf(Instant siteChange, AnalysisRevision r) {
        return r == null || siteChange.isAfter(r.createdAt()) ? siteChange : r.createdAt();
    }

}

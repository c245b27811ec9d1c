package org.lpzplanner.plan;

import java.util.Locale;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.sites.StructureCorrection;
import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.SitePages;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.ModelAndView;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/**
 * Page forms that change a stored site: rename ({@code POST /sites/{id}/name}), the address and
 * designer printed on the report's cover ({@code POST /sites/{id}/cover-details}), duplicate
 * ({@code POST /sites/{id}/duplicate}), delete after confirmation ({@code GET /sites/{id}/delete}
 * asks, {@code POST /sites/{id}/delete} with {@code confirm=yes} deletes) and the correction of one
 * structure ({@code POST /sites/{id}/structures}), which stores a corrected site file and analyses
 * the site again ({@link StructureCorrections}; when the analysis cannot run now, the plan page says
 * it is pending and why). Forms that change a site carry the version they were shown with; when the site
 * changed meanwhile the page is shown again with status 409, the current state and a note.
 */
@Controller
@SitePages
public class SiteActionsPageController {

    private final SiteService sites;
    private final StructureCorrections corrections;
    private final PlanPage planPage;

    public SiteActionsPageController(SiteService sites, StructureCorrections corrections, PlanPage planPage) {
        this.sites = sites;
        this.corrections = corrections;
        this.planPage = planPage;
    }

    @PostMapping("/sites/{id}/name")
    public ModelAndView rename(@PathVariable long id, @RequestParam(required = false) String name,
            @RequestParam(required = false) Long version, Locale locale) {
        try {
            sites.update(id, requireVersion(version), name == null ? "" : name, null, null);
            return new ModelAndView("redirect:/sites/" + id);
        } catch (InvalidInputException e) {
            ModelAndView page = plan(id, locale, HttpStatus.BAD_REQUEST);
            page.addObject("renameError", e.getMessage());
            page.addObject("enteredName", name);
            return page;
        } catch (OptimisticLockingFailureException e) {
            ModelAndView page = plan(id, locale, HttpStatus.CONFLICT);
            page.addObject("renameClash", true);
            page.addObject("enteredName", name);
            return page;
        }
    }

    /** The address and designer printed on the report's cover; blank clears. */
    @PostMapping("/sites/{id}/cover-details")
    public ModelAndView coverDetails(@PathVariable long id, @RequestParam(required = false) String address,
            @RequestParam(required = false) String designer, @RequestParam(required = false) Long version,
            Locale locale) {
        try {
            sites.updateCoverDetails(id, requireVersion(version), address == null ? "" : address,
                    designer == null ? "" : designer);
            return new ModelAndView("redirect:/sites/" + id);
        } catch (InvalidInputException e) {
            ModelAndView page = plan(id, locale, HttpStatus.BAD_REQUEST);
            page.addObject("coverError", e.getMessage());
            page.addObject("enteredAddress", address);
            page.addObject("enteredDesigner", designer);
            return page;
        } catch (OptimisticLockingFailureException e) {
            ModelAndView page = plan(id, locale, HttpStatus.CONFLICT);
            page.addObject("coverClash", true);
            page.addObject("enteredAddress", address);
            page.addObject("enteredDesigner", designer);
            return page;
        }
    }

    @PostMapping("/sites/{id}/duplicate")
    public String duplicate(@PathVariable long id) {
        return "redirect:/sites/" + sites.duplicate(id).id();
    }

    /** Asks for confirmation; deletes nothing. */
    @GetMapping("/sites/{id}/delete")
    public ModelAndView confirmDelete(@PathVariable long id) {
        return confirmPage(sites.get(id), HttpStatus.OK);
    }

    @PostMapping("/sites/{id}/delete")
    public ModelAndView delete(@PathVariable long id, @RequestParam(required = false) String confirm,
            @RequestParam(required = false) Long version) {
        StoredSite site = sites.get(id);
        if (!"yes".equals(confirm)) {
            ModelAndView page = confirmPage(site, HttpStatus.BAD_REQUEST);
            page.addObject("notConfirmed", true);
            return page;
        }
        try {
            sites.delete(id, requireVersion(version));
            return new ModelAndView("redirect:/");
        } catch (InvalidInputException e) {
            return confirmPage(site, HttpStatus.BAD_REQUEST);
        } catch (OptimisticLockingFailureException e) {
            ModelAndView page = confirmPage(sites.get(id), HttpStatus.CONFLICT);
            page.addObject("deleteClash", true);
            return page;
        }
    }

    @PostMapping("/sites/{id}/structures")
    public ModelAndView correct(@PathVariable long id, @RequestParam(required = false) Integer structure,
            @RequestParam(required = false) String height, @RequestParam(required = false) String roof,
            @RequestParam(required = false) String ridgeHeight, @RequestParam(required = false) String bearing,
            @RequestParam(required = false) String parapet, @RequestParam(required = false) Long version,
            Locale locale, RedirectAttributes redirect) {
        StructureCorrection correction = new StructureCorrection(structure == null ? -1 : structure, height, roof,
                ridgeHeight, bearing, parapet);
        Edit<Void> edit;
        try {
            edit = corrections.correct(id, requireVersion(version), correction);
        } catch (InvalidInputException | SiteFormatException e) {
            ModelAndView page = plan(id, locale, HttpStatus.BAD_REQUEST);
            page.addObject("correctionError", e.getMessage());
            page.addObject("correction", correction);
            return page;
        } catch (OptimisticLockingFailureException e) {
            ModelAndView page = plan(id, locale, HttpStatus.CONFLICT);
            page.addObject("correctionClash", true);
            page.addObject("correction", correction);
            return page;
        }
        PlanPage.notePending(edit, redirect);
        return new ModelAndView("redirect:/sites/" + id);
    }

    private ModelAndView plan(long id, Locale locale, HttpStatus status) {
        ModelAndView page = new ModelAndView("sites/plan", status);
        page.addAllObjects(planPage.attributes(id, locale));
        return page;
    }

    private static ModelAndView confirmPage(StoredSite site, HttpStatus status) {
        ModelAndView page = new ModelAndView("sites/delete", status);
        page.addObject("site", site);
        return page;
    }

    private static long requireVersion(Long version) {
        if (version == null) {
            throw new InvalidInputException("version", "the form is missing the site's version; reload the page");
        }
        return version;
    }
}

package org.lpzplanner.risk;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import org.springframework.web.servlet.ModelAndView;

/**
 * The risk page of a site ({@code /sites/{id}/risk}): shows the inputs and the result, saves the
 * inputs ({@code POST /sites/{id}/risk}; a value that cannot be used is shown again with the reason
 * and nothing is saved) and makes the lowest sufficient protection level the site's level
 * ({@code POST /sites/{id}/risk/level}).
 */
@Controller
public class RiskPageController {

    private final RiskPage page;
    private final RiskService risk;

    RiskPageController(RiskPage page, RiskService risk) {
        this.page = page;
        this.risk = risk;
    }

    @GetMapping("/sites/{id}/risk")
    public String show(@PathVariable long id, @RequestParam(required = false) String levelSet,
            @RequestParam(required = false) String saved, Model model, Locale locale) {
        model.addAllAttributes(page.attributes(id, null, locale));
        model.addAttribute("levelSet", levelName(levelSet));
        model.addAttribute("justSaved", saved != null);
        return "risk/risk";
    }

    /** An unknown site, or an id that is not a number: the 404 page of the site pages. */
    @ExceptionHandler({SiteNotFoundException.class, MethodArgumentTypeMismatchException.class})
    ModelAndView notFound(Exception e) {
        ModelAndView view = new ModelAndView("sites/not-found", HttpStatus.NOT_FOUND);
        view.addObject("siteId", e instanceof SiteNotFoundException n ? String.valueOf(n.siteId())
                : String.valueOf(((MethodArgumentTypeMismatchException) e).getValue()));
        return view;
    }

    /** The level named in the redirect after a level was set; anything else shows no message. */
    private static String levelName(String text) {
        for (ProtectionLevel level : ProtectionLevel.values()) {
            if (level.name().equals(text)) {
                return level.name();
            }
        }
        return null;
    }

    @PostMapping("/sites/{id}/risk")
    public ModelAndView save(@PathVariable long id, @RequestParam Map<String, String> form, Locale locale) {
        Map<String, String> entered = new LinkedHashMap<>();
        RiskSettingsParser.FIELDS.forEach(f -> entered.put(f, form.getOrDefault(f, "")));
        for (int i = 0; i < RiskSettingsParser.MAX_LINES; i++) {
            for (String f : RiskSettingsParser.LINE_FIELDS) {
                String name = RiskSettingsParser.lineField(i, f);
                if (form.containsKey(name)) {
                    entered.put(name, form.get(name));
                }
            }
        }
        try {
            risk.save(id, entered::get);
            return new ModelAndView("redirect:/sites/" + id + "/risk?saved=true");
        } catch (InvalidInputException e) {
            ModelAndView view = new ModelAndView("risk/risk", HttpStatus.BAD_REQUEST);
            view.addAllObjects(page.attributes(id, entered, locale));
            view.addObject("inputError", e.getMessage());
            view.addObject("errorField", e.field());
            return view;
        }
    }

    @PostMapping("/sites/{id}/risk/level")
    public ModelAndView selectLevel(@PathVariable long id, @RequestParam(required = false) Long version,
            Locale locale) {
        try {
            if (version == null) {
                throw new InvalidInputException("version", "version is missing: reload the page and try again");
            }
            ProtectionLevel level = risk.selectLevel(id, version);
            return new ModelAndView("redirect:/sites/" + id + "/risk?levelSet=" + level.name());
        } catch (InvalidInputException e) {
            ModelAndView view = new ModelAndView("risk/risk", HttpStatus.BAD_REQUEST);
            view.addAllObjects(page.attributes(id, null, locale));
            view.addObject("levelError", e.getMessage());
            return view;
        } catch (OptimisticLockingFailureException e) {
            ModelAndView view = new ModelAndView("risk/risk", HttpStatus.CONFLICT);
            view.addAllObjects(page.attributes(id, null, locale));
            view.addObject("levelClash", true);
            return view;
        }
    }
}

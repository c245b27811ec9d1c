package org.lpzplanner.design;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.analysis.ReviewService;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.common.Formats;
import org.lpzplanner.keepout.KeepOutArea;
import org.lpzplanner.keepout.KeepOutAreaService;
import org.lpzplanner.plan.PlanPresenter;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.SitePages;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/**
 * The design page of a site ({@code /sites/{id}/design}): the proposal form (run by the
 * design-page script through the JSON API), the method cross-checks, down-conductors (edited by a
 * plain form), separation distances with the metal installations, and the bill of quantities.
 */
@Controller
@SitePages
public class DesignPageController {

    private final SiteService sites;
    private final AnalysisService analyses;
    private final ReviewService reviews;
    private final MethodCheckService methodChecks;
    private final SeparationService separations;
    private final MetalInstallationService installations;
    private final QuantityService quantities;
    private final PlanPresenter plan;
    private final KeepOutAreaService keepOut;
    private final DownConductorService downConductors;
    private final org.lpzplanner.heavywork.HeavyWorkCapacity capacity;

    DesignPageController(SiteService sites, AnalysisService analyses, ReviewService reviews,
            MethodCheckService methodChecks, SeparationService separations, MetalInstallationService installations,
            QuantityService quantities, PlanPresenter plan, KeepOutAreaService keepOut,
            DownConductorService downConductors, org.lpzplanner.heavywork.HeavyWorkCapacity capacity) {
        this.capacity = capacity;
        this.keepOut = keepOut;
        this.downConductors = downConductors;
        this.sites = sites;
        this.analyses = analyses;
        this.reviews = reviews;
        this.methodChecks = methodChecks;
        this.separations = separations;
        this.installations = installations;
        this.quantities = quantities;
        this.plan = plan;
    }

    @GetMapping("/sites/{id}/design")
    public String page(@PathVariable long id, @RequestParam(defaultValue = "1") String fixingsPerMetre, Model model,
            Locale locale) {
        StoredSite site = sites.get(id);
        AnalysisRevision latest = analyses.latest(id).orElse(null);
        model.addAttribute("site", site);
        model.addAttribute("method", ResultGeoJson.METHOD);
        model.addAttribute("level", site.sphere().level().name());
        model.addAttribute("radius", Centimetres.round(site.sphere().radius()));
        model.addAttribute("editable", sites.isGeoJson(site));
        model.addAttribute("cautions", Cautions.lines());
        List<KeepOutArea> areas = keepOut.areas(id);
        model.addAttribute("keepOutAreas", areas.stream().map(KeepOutRow::of).toList());
        if (latest != null) {
            ReviewService.Review review = reviews.review(latest);
            model.addAttribute("svg", plan.drawing(id, latest, review.accepted(), locale));
        }
        double rate;
        try {
            rate = Double.parseDouble(fixingsPerMetre.strip());
        } catch (NumberFormatException e) {
            rate = 1;
        }
        rate = Math.max(0, Math.min(20, rate));
        model.addAttribute("fixingsPerMetre", rate);
        double fixings = rate;
        // the page's checks share one place of the instance's capacity for long computations
        capacity.run("design checks", () -> designChecks(id, fixings, model));
        return "sites/design";
    }

    private Void designChecks(long id, double rate, Model model) {
        model.addAttribute("checks", methodChecks.methodChecks(id));
        List<DownConductorService.DownConductors> downs = downConductors.list(id);
        model.addAttribute("downConductors", downs);
        Map<String, String> positionsText = new LinkedHashMap<>();
        for (DownConductorService.DownConductors d : downs) {
            List<String> lines = new ArrayList<>();
            for (double[] p : d.positions()) {
                lines.add(Formats.coordinate(p[0]) + ", " + Formats.coordinate(p[1]));
            }
            positionsText.put(d.buildingId(), String.join("\n", lines));
        }
        model.addAttribute("positionsText", positionsText);
        model.addAttribute("separations", separations.separations(id));
        model.addAttribute("installations", installations.list(id));
        model.addAttribute("quantities", quantities.quantities(id, rate));
        return null;
    }

    /** A stored keep-out area as the design page lists it: name, area and corners written out. */
    record KeepOutRow(long id, String name, String area, int cornerCount, String corners) {

        static KeepOutRow of(KeepOutArea a) {
            List<String> corners = new ArrayList<>();
            for (double[] c : a.corners()) {
                corners.add(Formats.coordinate(c[0]) + " " + Formats.coordinate(c[1]));
            }
            return new KeepOutRow(a.id(), a.name(), Formats.area(a.area()), a.corners().size(),
                    String.join("; ", corners));
        }
    }

    @PostMapping("/sites/{id}/design/down-conductors/{buildingId}")
    public String saveDownConductors(@PathVariable long id, @PathVariable String buildingId,
            @RequestParam(defaultValue = "") String positions, @RequestParam(required = false) String reset,
            RedirectAttributes redirect) {
        try {
            if (reset != null) {
                downConductors.reset(id, buildingId);
            } else {
                downConductors.save(id, buildingId, parsePositions(positions));
            }
        } catch (InvalidInputException e) {
            redirect.addFlashAttribute("downError", e.getMessage());
        }
        return "redirect:/sites/" + id + "/design#down-conductors";
    }

    @PostMapping("/sites/{id}/design/installations")
    public String addInstallation(@PathVariable long id, @RequestParam(defaultValue = "") String name,
            @RequestParam(defaultValue = "") String x, @RequestParam(defaultValue = "") String y,
            @RequestParam(defaultValue = "") String z, @RequestParam(defaultValue = "AIR") String material,
            RedirectAttributes redirect) {
        try {
            installations.add(id, name, number("x", x), number("y", y), number("z", z), material);
        } catch (InvalidInputException e) {
            redirect.addFlashAttribute("installationError", e.getMessage());
        }
        return "redirect:/sites/" + id + "/design#separation";
    }

    @PostMapping("/sites/{id}/design/installations/{installationId}/delete")
    public String removeInstallation(@PathVariable long id, @PathVariable long installationId) {
        installations.remove(id, installationId);
        return "redirect:/sites/" + id + "/design#separation";
    }

    /** "x, y" per line (or separated by semicolons) into positions. */
    static List<double[]> parsePositions(String text) {
        List<double[]> out = new ArrayList<>();
        int line = 0;
        for (String raw : text.split("[;\\n]")) {
            line++;
            String s = raw.strip();
            if (s.isEmpty()) {
                continue;
            }
            String[] parts = s.split("[,\\s]+");
            if (parts.length != 2) {
                throw new InvalidInputException("positions", "line " + line + ": write one position as \"x, y\" in metres, got \"" + s + "\"");
            }
            out.add(new double[] {number("positions", parts[0]), number("positions", parts[1])});
        }
        return out;
    }

    private static double number(String field, String text) {
        try {
            double v = Double.parseDouble(text.strip());
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new InvalidInputException(field, field + " must be a number of metres, got \"" + text.strip() + "\"");
    }
}

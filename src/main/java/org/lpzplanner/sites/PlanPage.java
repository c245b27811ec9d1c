package org.lpzplanner.sites;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.PlanSvg;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.springframework.context.MessageSource;
import org.springframework.stereotype.Component;

/**
 * Everything the plan page shows of a site: its settings, the structures read from its file, the
 * earlier files, and the latest analysis with drawing, summary, method, level, radius and cautions.
 * Used both for the page itself and when a form on it is answered with an error.
 */
@Component
class PlanPage {

    private static final List<String> ROOF_FORMS = List.of("flat", "gable", "hip", "shed");

    private final SiteService sites;
    private final AnalysisService analyses;
    private final MessageSource messages;

    PlanPage(SiteService sites, AnalysisService analyses, MessageSource messages) {
        this.sites = sites;
        this.analyses = analyses;
        this.messages = messages;
    }

    /** @throws SiteNotFoundException when no site has this id */
    Map<String, Object> attributes(long id, Locale locale) {
        StoredSite site = sites.get(id);
        AnalysisRevision latest = analyses.latest(id).orElse(null);
        Map<String, Object> model = new LinkedHashMap<>();
        model.put("site", site);
        model.put("lastChange", SitePageController.WHEN.format(site.updatedAt()));
        model.put("latest", latest);
        model.put("method", ResultGeoJson.METHOD);
        model.put("cautions", Cautions.lines());
        model.put("levels", ProtectionLevel.values());
        model.put("structures", sites.structures(site));
        model.put("roofForms", ROOF_FORMS);
        model.put("fullCorrection", sites.isGeoJson(site));
        model.put("fileVersions", sites.fileVersions(id).stream()
                .map(v -> new EarlierFile(v.number(), v.sourceName(), SitePageController.WHEN.format(v.replacedAt())))
                .toList());
        if (latest != null) {
            model.put("analysedAt", SitePageController.WHEN.format(latest.createdAt()));
            model.put("radius", SitePageController.number(latest.sphereRadius()));
            model.put("summary", summary(latest));
            model.put("svg", PlanSvg.render(latest.resultGeoJson(),
                    (key, args) -> messages.getMessage(key, args, locale)));
        }
        return model;
    }

    /** An earlier file as the page lists it. */
    record EarlierFile(int number, String fileName, String replacedAt) {
    }

    /** Summary table rows: message key and value. */
    private static List<Map.Entry<String, String>> summary(AnalysisRevision r) {
        return List.of(
                Map.entry("summary.revision", String.valueOf(r.revision())),
                Map.entry("summary.exposedRoof", SitePageController.number(r.exposedRoofArea())),
                Map.entry("summary.exposedEdges", SitePageController.number(r.exposedEdgeLength())),
                Map.entry("summary.corners", String.valueOf(r.exposedCorners())),
                Map.entry("summary.facadeBands", String.valueOf(r.facadeBands())),
                Map.entry("summary.protectedGround", SitePageController.number(r.protectedGroundArea())),
                Map.entry("summary.resolution", SitePageController.number(r.resolution())),
                Map.entry("summary.engineTime", String.valueOf(r.engineMillis())),
                Map.entry("summary.checksum", r.inputsSha256()));
    }
}

package org.lpzplanner.risk;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.io.Json;
import org.lpzplanner.drawing.Layer;
import org.lpzplanner.drawing.PlanSvgRenderer;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.sites.PlanContribution;
import org.lpzplanner.sites.StoredSite;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.context.MessageSource;
import org.springframework.stereotype.Component;

/**
 * The risk estimate on the plan page: the level the analysis form starts at, with a note saying
 * why, and the collection area as a layer the user can switch on, styled as {@link PlanSvgRenderer}
 * styles it.
 *
 * <p>The form starts at the lowest sufficient level of the saved risk inputs, unless the site's own
 * level is stricter (a smaller sphere: kept, on the safe side). While no inputs are saved, an input
 * without a default is missing, or the structure is outside the estimate, there is no estimate, so
 * the form keeps the site's level. When even
 * level I is not enough, it starts at level I.
 */
@Component
class RiskPlanContribution implements PlanContribution {

    private static final Logger LOG = LoggerFactory.getLogger(RiskPlanContribution.class);

    private final RiskService risk;
    private final MessageSource messages;

    RiskPlanContribution(RiskService risk, MessageSource messages) {
        this.risk = risk;
        this.messages = messages;
    }

    @Override
    public Map<String, Object> attributes(StoredSite site, Locale locale) {
        RiskAssessment a;
        try {
            a = risk.assess(site.id());
        } catch (RuntimeException e) {
            // the plan must show even when the estimate cannot be made; the risk page names the reason
            LOG.warn("risk estimate of site {} for its plan page failed: {}", site.id(), e.toString());
            return Map.of();
        }
        Map<String, Object> model = new LinkedHashMap<>();
        ProtectionLevel start = site.level();
        String r1 = a.hasVerdict() ? RiskFormat.scientific(a.withoutLps().r1()) : null;
        String note;
        if (!a.saved()) {
            note = text(locale, "plan.riskLevel.unsaved", site.level().name());
        } else if (!a.complete()) {
            note = text(locale, "plan.riskLevel.incomplete", site.level().name(), risk.missingText(a, locale));
        } else if (!a.hasVerdict()) {
            note = text(locale, "plan.riskLevel.outside", site.level().name());
        } else if (a.choice().chosen().isEmpty()) {
            start = ProtectionLevel.I;
            note = text(locale, "plan.riskLevel.insufficient", r1);
        } else if (a.choice().level().isEmpty()) {
            note = text(locale, "plan.riskLevel.noLps", site.level().name(), r1);
        } else {
            ProtectionLevel needed = a.choice().level().get();
            if (site.level().ordinal() < needed.ordinal()) {
                note = text(locale, "plan.riskLevel.stricterKept", site.level().name(), needed.name());
            } else {
                start = needed;
                note = site.level() == needed ? text(locale, "plan.riskLevel.recommended", needed.name(), r1)
                        : text(locale, "plan.riskLevel.recommendedOverSite", needed.name(), r1, site.level().name());
            }
        }
        model.put("analysisLevel", start);
        model.put("analysisLevelNote", note);
        model.put("collectionZone", rings(a.area().zone()));
        model.put("collectionAreaText", RiskFormat.area(a.area().upperBound()));
        // drawn by the page's script into the plan, as the plan's renderer draws the layer
        model.put("collectionAreaStyle", Json.MAPPER.writeValueAsString(PlanSvgRenderer.areaAttributes(Layer.COLLECTION_AREA)));
        return model;
    }

    /** The zone's rings as JSON, {@code [[[x, y], ...], ...]} in local metres (holes drawn even-odd). */
    static String rings(Geometry zone) {
        StringBuilder json = new StringBuilder("[");
        for (int i = 0; i < zone.getNumGeometries(); i++) {
            if (zone.getGeometryN(i) instanceof Polygon p && !p.isEmpty()) {
                ring(json, p.getExteriorRing().getCoordinates());
                for (int h = 0; h < p.getNumInteriorRing(); h++) {
                    ring(json, p.getInteriorRingN(h).getCoordinates());
                }
            }
        }
        return json.append(']').toString();
    }

    private static void ring(StringBuilder json, Coordinate[] points) {
        if (json.length() > 1) {
            json.append(',');
        }
        json.append('[');
        for (int i = 0; i < points.length; i++) {
            json.append(i == 0 ? "" : ",").append(String.format(Locale.ROOT, "[%.2f,%.2f]", points[i].x, points[i].y));
        }
        json.append(']');
    }

    private String text(Locale locale, String key, Object... args) {
        return messages.getMessage(key, args, locale);
    }
}

package org.lpzplanner.sections;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.Envelope;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.common.Formats;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.envelope.EnvelopeOp;
import org.lpzplanner.engine.exposure.ResolutionChoice;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.heavywork.HeavyWorkCapacity;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.context.MessageSource;
import org.springframework.stereotype.Component;

/**
 * The section page of a site: a vertical cut along a line in local metres, drawn with the sphere of
 * the latest analysis (the site's own sphere when it was never analysed). Also offers the cut the
 * plan page suggests: through the middle of the site's extent along x, reaching one sphere radius
 * beyond it on each side.
 */
@Component
public final class SectionPage {

    /** Shortest cut drawn, metres. */
    static final double MIN_LENGTH = 1;
    /** Longest cut drawn, metres: keeps the sampling (every 0.25 m) to a few thousand points. */
    static final double MAX_LENGTH = 2000;

    private static final java.util.regex.Pattern DECIMAL = java.util.regex.Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)");
    private static final String[] FIELDS = {"x1", "y1", "x2", "y2"};

    private final SiteService sites;
    private final AnalysisService analyses;
    private final MessageSource messages;
    private final HeavyWorkCapacity capacity;

    SectionPage(SiteService sites, AnalysisService analyses, MessageSource messages, HeavyWorkCapacity capacity) {
        this.capacity = capacity;
        this.sites = sites;
        this.analyses = analyses;
        this.messages = messages;
    }

    /**
     * @param texts x1, y1, x2, y2 as typed; all blank or missing for the suggested cut
     * @throws SiteNotFoundException when no site has this id
     * @throws InvalidInputException when a number cannot be read or the cut is too short or too long
     * @throws org.lpzplanner.heavywork.HeavyWorkBusyException when no place for long computations came
     *         free within the wait (the envelope is computed within the instance's capacity)
     */
    Map<String, Object> attributes(long id, String[] texts, Locale locale) {
        StoredSite site = sites.get(id);
        AnalysisRevision latest = analyses.latest(id).orElse(null);
        ProtectionLevel level = latest == null ? site.level() : latest.level();
        double radius = latest == null ? site.sphere().radius() : latest.sphereRadius();
        SiteDocument document = sites.document(site);
        SiteSurface surface = SiteSurfaceBuilder.build(document.site());
        double[] cut = allBlank(texts) ? suggestedCut(document.site(), radius) : cut(texts);
        double resolution = latest == null ? ResolutionChoice.choose(surface, radius) : latest.resolution();
        SiteSection section = capacity.run("section", () -> {
            // the envelope has no hook to stop it midway: the budget is checked when it is done
            EnvelopeField field = EnvelopeOp.compute(surface, radius, resolution);
            capacity.checkBudget();
            return SiteSection.cut(surface, field, cut[0], cut[1], cut[2], cut[3]);
        });
        Map<String, Object> model = new LinkedHashMap<>();
        model.put("site", site);
        model.put("method", ResultGeoJson.METHOD);
        model.put("level", level.name());
        model.put("radius", Formats.radius(radius));
        model.put("cut", formatted(cut));
        model.put("length", Formats.oneDecimal(section.length()));
        model.put("analysed", latest != null);
        model.put("cautions", Cautions.lines());
        model.put("svg", SectionSvg.render(section, (key, args) -> messages.getMessage(key, args, locale)));
        return model;
    }

    /** The suggested cut of a stored site, numbers as the form shows them (x1, y1, x2, y2). */
    public String[] suggestedCut(StoredSite site, double radius) {
        return formatted(suggestedCut(sites.document(site).site(), radius));
    }

    /** Through the middle of the extent of footprints and rods, along x, one radius beyond each side. */
    static double[] suggestedCut(Site site, double radius) {
        Envelope extent = new Envelope();
        for (Structure s : site.structures()) {
            extent.expandToInclude(s.footprint().getEnvelopeInternal());
        }
        for (Rod r : site.rods()) {
            extent.expandToInclude(r.x(), r.y());
        }
        if (extent.isNull()) {
            extent.expandToInclude(0, 0);
        }
        double y = Math.round((extent.getMinY() + extent.getMaxY()) / 2 * 100) / 100.0;
        return new double[] {Math.floor(extent.getMinX() - radius), y, Math.ceil(extent.getMaxX() + radius), y};
    }

    static double[] cut(String[] texts) {
        double[] cut = new double[4];
        for (int i = 0; i < 4; i++) {
            String text = texts[i] == null ? "" : texts[i].strip();
            if (text.isEmpty()) {
                throw new InvalidInputException(FIELDS[i], FIELDS[i] + " is missing: give it in metres, e.g. 12.5");
            }
            cut[i] = DECIMAL.matcher(text).matches() ? Double.parseDouble(text) : Double.NaN;
            if (!Double.isFinite(cut[i])) {
                throw new InvalidInputException(FIELDS[i], FIELDS[i] + " must be a number of metres, e.g. 12.5; got \""
                        + text + "\"");
            }
        }
        return checked(cut);
    }

    /**
     * Checks a cut's length: its ends (x1, y1, x2, y2, finite) at least {@value #MIN_LENGTH} m and at
     * most {@value #MAX_LENGTH} m apart.
     *
     * @throws InvalidInputException naming x2 otherwise
     */
    static double[] checked(double[] cut) {
        double length = Math.hypot(cut[2] - cut[0], cut[3] - cut[1]);
        if (length < MIN_LENGTH) {
            throw new InvalidInputException("x2", "the cut is " + Formats.length(length)
                    + " m long; its ends must be at least 1 m apart");
        }
        if (length > MAX_LENGTH) {
            throw new InvalidInputException("x2", "the cut is " + Formats.length(length)
                    + " m long; draw sections of at most 2000 m");
        }
        return cut;
    }

    private static boolean allBlank(String[] texts) {
        for (String t : texts) {
            if (t != null && !t.isBlank()) {
                return false;
            }
        }
        return true;
    }

    private static String[] formatted(double[] cut) {
        String[] out = new String[4];
        for (int i = 0; i < 4; i++) {
            double v = Math.round(cut[i] * 100) / 100.0;
            out[i] = v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
        }
        return out;
    }
}

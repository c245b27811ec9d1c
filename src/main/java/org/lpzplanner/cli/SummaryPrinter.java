package org.lpzplanner.cli;

import java.io.PrintStream;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.analysis.ResultTotals;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.FacadeBand;
import org.lpzplanner.engine.exposure.ModelWarning;
import org.lpzplanner.engine.exposure.PartInterception;
import org.lpzplanner.engine.exposure.SideFlashRule;
import org.lpzplanner.engine.geom.EdgeKind;
import org.lpzplanner.engine.geom.SurfaceKind;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * The plain-text summary of one analysis, for a terminal. Numbers use a dot as decimal separator
 * whatever the machine's locale, and units are written in ASCII ("m2") so the text survives any
 * console encoding.
 */
final class SummaryPrinter {

    private static final int WIDTH = 96;

    private final PrintStream out;

    SummaryPrinter(PrintStream out) {
        this.out = out;
    }

    /** Prints the whole summary, ending with the cautions. */
    void print(SiteDocument document, AnalysisResult result) {
        ResultTotals totals = ResultTotals.of(result);
        header(document, result);
        roofs(totals);
        edges(totals, result);
        facades(result);
        parts(result);
        warnings(result);
        line("Protected ground (LPZ 0B at ground level): %.1f m2", totals.protectedGround());
        line("Overall: %s", overall(result, totals));
        line("Time: envelope %d ms, total %d ms", result.envelopeMillis(), result.totalMillis());
        out.println();
        out.println("Cautions:");
        for (String caution : Cautions.lines()) {
            List<String> wrapped = wrap(caution, WIDTH - 4);
            for (int i = 0; i < wrapped.size(); i++) {
                out.println((i == 0 ? "  - " : "    ") + wrapped.get(i));
            }
        }
    }

    private void header(SiteDocument document, AnalysisResult result) {
        SphereSpec sphere = result.sphere();
        line("Site:             %s (%s, %s)", document.site().name(), document.sourceName(),
                document.georeferenced() ? "lon/lat" : "local metres");
        line("Protection level: %s", sphere.level().name());
        if (sphere.isCustomRadius()) {
            line("Sphere radius:    %s m (custom; level %s uses %s m)", number(sphere.radius()), sphere.level().name(),
                    number(sphere.level().sphereRadius()));
        } else {
            line("Sphere radius:    %s m", number(sphere.radius()));
        }
        line("Method:           %s (IEC 62305-3:2010)", ResultGeoJson.METHOD);
        line("Resolution:       %s m grid; tolerance %s m (envelope values are never above the true envelope)",
                number(result.resolution()), number(result.tolerance()));
        out.println();
    }

    private void roofs(ResultTotals totals) {
        if (totals.roofs().isEmpty()) {
            line("Exposed roof area: no roofs");
            return;
        }
        out.println("Exposed roof area:");
        List<String> names = new ArrayList<>();
        for (ResultTotals.OwnerRoof r : totals.roofs()) {
            names.add(r.ownerName() + (r.kind() == SurfaceKind.ROOFTOP_OBJECT ? " (rooftop object)" : ""));
        }
        // one column wide enough for the longest name keeps the figures aligned
        int width = Math.max("All roofs".length(), names.stream().mapToInt(String::length).max().orElse(0));
        String row = "  %-" + width + "s %9.1f m2 of %9.1f m2 %6.1f %%";
        for (int i = 0; i < names.size(); i++) {
            ResultTotals.OwnerRoof r = totals.roofs().get(i);
            line(row, names.get(i), r.exposedArea(), r.roofArea(), r.exposedPercent());
        }
        double all = totals.roofArea();
        line(row, "All roofs", totals.exposedRoofArea(), all, all > 0 ? 100 * totals.exposedRoofArea() / all : 0);
        out.println();
    }

    private void edges(ResultTotals totals, AnalysisResult result) {
        if (totals.edgeLengths().isEmpty()) {
            line("Exposed edges: none");
        } else {
            line("Exposed edges: %.2f m in total", totals.edgeLength());
            for (Map.Entry<EdgeKind, Double> e : totals.edgeLengths().entrySet()) {
                line("  %-22s %9.2f m", e.getKey().label(), e.getValue());
            }
        }
        line("Exposed corners: %d", result.corners().size());
        out.println();
    }

    /**
     * Facade bands in two lists by the tall-structure rule (IEC 62305-3:2010 5.2.3): those that need
     * lateral air-termination, then those where flashes to the side are negligible.
     */
    private void facades(AnalysisResult result) {
        List<SideFlashRule.Part> needing = result.facadePartsNeedingLateral();
        List<SideFlashRule.Part> negligible = result.facadeParts().stream()
                .filter(p -> !p.needsLateralAirTermination()).toList();
        bands("Facade bands " + ResultGeoJson.LATERAL_RULE.replaceFirst("^needs ", "needing "), needing);
        bands("Facade bands where " + ResultGeoJson.NEGLIGIBLE_RULE.replaceFirst("^flashes to the side negligible",
                "flashes to the side are negligible"), negligible);
        out.println();
    }

    private void bands(String heading, List<SideFlashRule.Part> parts) {
        if (parts.isEmpty()) {
            line("%s: none", heading);
            return;
        }
        line("%s: %d", heading, parts.size());
        for (SideFlashRule.Part p : parts) {
            FacadeBand f = p.band();
            line("  %s, wall %d: %.2f m long, from %.2f m to %.2f m above ground (building %.2f m)", f.ownerName(),
                    f.wallIndex() + 1, f.length(), p.bottom(), p.top(), p.buildingHeight());
        }
    }

    private void parts(AnalysisResult result) {
        if (result.parts().isEmpty()) {
            line("Air-termination parts: none in the site");
        } else {
            line("Air-termination parts: %d", result.parts().size());
            for (PartInterception p : result.parts()) {
                String kind = p.kind() == PartInterception.PartKind.ROD ? "rod" : "conductor";
                String label = p.partName() == null || p.partName().equals(p.partId())
                        ? p.partId() + " (" + kind + ")"
                        : p.partName() + " (" + p.partId() + ", " + kind + ")";
                line("  %s: %s", label, p.intercepts()
                        ? "intercepts"
                        : "does not intercept (lies inside the protection of other parts)");
            }
        }
        out.println();
    }

    /**
     * The model warnings, each naming its part, before the overall line: while one stands the
     * analysis gives no verdict of full protection.
     */
    private void warnings(AnalysisResult result) {
        if (result.warnings().isEmpty()) {
            line("Model warnings: none");
        } else {
            line("Model warnings: %d (no verdict of full protection while one stands)", result.warnings().size());
            for (ModelWarning w : result.warnings()) {
                String label = w.partName() == null || w.partName().equals(w.partId()) ? w.partId()
                        : w.partName() + " (" + w.partId() + ")";
                line("  %s: %s, up to %s m above the surface beneath it, more than the sphere radius %s m", label,
                        w.kind() == ModelWarning.Kind.FREE_SPAN ? "free span" : w.kind().name(),
                        number(ResultGeoJson.round(w.value())), number(ResultGeoJson.round(w.limit())));
                for (String wrapped : wrap(w.text(), WIDTH - 4)) {
                    out.println("    " + wrapped);
                }
            }
        }
        out.println();
    }

    private static String overall(AnalysisResult result, ResultTotals totals) {
        int warnings = result.warnings().size();
        if (warnings > 0) {
            return "no verdict of full protection: " + warnings + " model warning" + (warnings == 1 ? " stands"
                    : "s stand") + " (see above)" + (totals.anyExposed()
                            ? "; parts of the structures are also exposed to direct strikes (LPZ 0A)" : "");
        }
        return result.isFullyProtected() ? "no exposed roof, edge or corner and no facade band needing lateral"
                + " air-termination was found"
                : "parts of the structures are exposed to direct strikes (LPZ 0A)";
    }

    private void line(String format, Object... args) {
        out.println(String.format(Locale.ROOT, format, args));
    }

    /** A number without trailing zeros: 30 rather than 30.0, 0.25 as is. */
    static String number(double value) {
        return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }

    /** Splits text at spaces into lines of at most {@code width} characters (longer words stay whole). */
    static List<String> wrap(String text, int width) {
        List<String> lines = new ArrayList<>();
        StringBuilder current = new StringBuilder();
        for (String word : text.split(" ")) {
            if (current.length() > 0 && current.length() + 1 + word.length() > width) {
                lines.add(current.toString());
                current.setLength(0);
            }
            if (current.length() > 0) {
                current.append(' ');
            }
            current.append(word);
        }
        if (current.length() > 0) {
            lines.add(current.toString());
        }
        return lines;
    }
}

package org.lpzplanner.cli;

import java.io.PrintStream;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.envelope.EnvelopeOp;
import org.lpzplanner.engine.exposure.ResolutionChoice;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.model.Structure;

/**
 * {@code envelope}: the protection envelope's height above ground at given points, as CSV
 * {@code x,y,envelope_m}. x and y are echoed as written in the points file; the height is the
 * engine's exact-point value (a lower bound, at most {@link #TOLERANCE} below the true envelope),
 * cut down (never rounded up) to 3 decimals so the printed value is never above the engine's.
 */
final class EnvelopeCommand implements Command {

    static final String POINTS = "--points";

    /** How far below the true envelope a printed value may be, metres. */
    static final double TOLERANCE = 0.001;

    @Override
    public String name() {
        return "envelope";
    }

    @Override
    public Set<String> optionNames() {
        Set<String> names = new HashSet<>(AssessmentSettings.OPTION_NAMES);
        names.add(POINTS);
        return names;
    }

    @Override
    public void run(CliOptions options, PrintStream out) {
        AssessmentSettings settings = AssessmentSettings.from(options);
        Path pointsFile = options.inputFile(POINTS, "POINTS.csv");
        SiteDocument document = settings.readSite();
        List<PointsCsv.Point> points = PointsCsv.read(pointsFile, SiteFrame.of(document),
                centre(document));
        EnvelopeField envelope = envelope(document, settings);
        out.println("x,y,envelope_m");
        for (PointsCsv.Point p : points) {
            double height = envelope.heightAt(p.local().x, p.local().y, TOLERANCE);
            out.println(p.x() + "," + p.y() + "," + floor3(height));
        }
    }

    /**
     * Only the envelope is needed here, so the exposure steps of a full analysis are skipped; the
     * grid spacing is chosen exactly as the full analysis chooses it.
     */
    private static EnvelopeField envelope(SiteDocument document, AssessmentSettings settings) {
        SiteSurface surface = SiteSurfaceBuilder.build(document.site());
        double radius = settings.sphere().radius();
        double h = settings.resolution() != null ? settings.resolution() : ResolutionChoice.choose(surface, radius);
        return EnvelopeOp.compute(surface, radius, h);
    }

    private static Coordinate centre(SiteDocument document) {
        Envelope extent = new Envelope();
        for (Structure s : document.site().structures()) {
            extent.expandToInclude(s.footprint().getEnvelopeInternal());
        }
        return extent.centre();
    }

    /** The value with 3 decimals, rounded toward minus infinity. */
    static String floor3(double value) {
        return BigDecimal.valueOf(value).setScale(3, RoundingMode.FLOOR).toPlainString();
    }
}

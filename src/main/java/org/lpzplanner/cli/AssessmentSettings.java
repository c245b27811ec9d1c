package org.lpzplanner.cli;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Set;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * What every assessing command needs: the site file, the sphere (level and optional custom radius)
 * and the optional grid resolution, validated.
 *
 * @param site       the site file, known to exist
 * @param sphere     the level and the radius to roll
 * @param resolution grid spacing in metres, or null to let the engine choose
 */
record AssessmentSettings(Path site, SphereSpec sphere, Double resolution) {

    static final String SITE = "--site";
    static final String LEVEL = "--level";
    static final String RADIUS = "--radius";
    static final String RESOLUTION = "--resolution";

    /** The option names read here. */
    static final Set<String> OPTION_NAMES = Set.of(SITE, LEVEL, RADIUS, RESOLUTION);

    /** Same bounds as the engine's, checked here to name the option in the message. */
    static final double MIN_RESOLUTION = 0.05;
    static final double MAX_RESOLUTION = 10;
    static final double MAX_RADIUS = 1000;

    /**
     * Reads and checks the settings.
     *
     * @throws CliException naming the option at fault
     */
    static AssessmentSettings from(CliOptions options) {
        options.required(SITE, "FILE"); // a missing site is reported before any bad value
        String levelText = options.required(LEVEL, "I|II|III|IV");
        ProtectionLevel level = ProtectionLevel.parse(levelText);
        if (level == null) {
            throw new CliException("option --level must be I, II, III or IV, got \"" + levelText + "\"");
        }
        Double radius = options.decimal(RADIUS);
        if (radius != null && !(radius > 0 && radius <= MAX_RADIUS)) {
            throw new CliException("option --radius must be above 0 and at most " + (int) MAX_RADIUS
                    + " m, got " + options.value(RADIUS));
        }
        Double resolution = options.decimal(RESOLUTION);
        if (resolution != null && !(resolution >= MIN_RESOLUTION && resolution <= MAX_RESOLUTION)) {
            throw new CliException(String.format(Locale.ROOT, "option --resolution must be between %s and %s m, got %s",
                    MIN_RESOLUTION, (int) MAX_RESOLUTION, options.value(RESOLUTION)));
        }
        Path site = options.inputFile(SITE, "FILE");
        SphereSpec sphere = radius == null ? SphereSpec.of(level) : new SphereSpec(level, radius);
        return new AssessmentSettings(site, sphere, resolution);
    }

    /** Options for the engine, with its default tolerance for exact envelope values. */
    AnalysisOptions analysisOptions() {
        return new AnalysisOptions(sphere, resolution, AnalysisOptions.DEFAULT_TOLERANCE);
    }

    /**
     * Reads the site file.
     *
     * @throws CliException carrying the reader's message, which names file, feature and field
     */
    SiteDocument readSite() {
        try {
            return SiteReader.read(site);
        } catch (SiteFormatException e) {
            throw new CliException(e.getMessage(), e);
        }
    }
}

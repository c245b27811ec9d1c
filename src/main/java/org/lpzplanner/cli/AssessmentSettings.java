package org.lpzplanner.cli;

import java.nio.file.Path;
import java.util.Set;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SettingRange;
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
        Double radius = inRange(options, RADIUS, SettingRange.RADIUS);
        Double resolution = inRange(options, RESOLUTION, SettingRange.RESOLUTION);
        Path site = options.inputFile(SITE, "FILE");
        SphereSpec sphere = radius == null ? SphereSpec.of(level) : new SphereSpec(level, radius);
        return new AssessmentSettings(site, sphere, resolution);
    }

    /** The option's number, checked against the engine's range here to name the option in the message. */
    private static Double inRange(CliOptions options, String option, SettingRange range) {
        Double value = options.decimal(option);
        if (value != null && !range.contains(value)) {
            throw new CliException("option " + option + " must be " + range.rule() + ", got " + options.value(option));
        }
        return value;
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

package org.lpzplanner.risk;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.lpzplanner.engine.risk.EntrySurgeProtection;
import org.lpzplanner.engine.risk.FireProvisions;
import org.lpzplanner.engine.risk.FireRisk;
import org.lpzplanner.engine.risk.IncomingLine;
import org.lpzplanner.engine.risk.LineEnvironment;
import org.lpzplanner.engine.risk.LineInstallation;
import org.lpzplanner.engine.risk.LineShielding;
import org.lpzplanner.engine.risk.LineTouchProtection;
import org.lpzplanner.engine.risk.LineTransformer;
import org.lpzplanner.engine.risk.LocationFactor;
import org.lpzplanner.engine.risk.Occupancy;
import org.lpzplanner.engine.risk.SpecialHazard;
import org.lpzplanner.engine.risk.StructureUse;
import org.lpzplanner.engine.risk.SurfaceType;
import org.lpzplanner.engine.risk.TouchStepProtection;
import org.lpzplanner.engine.risk.WithstandVoltage;
import org.lpzplanner.system.InvalidInputException;

/**
 * Reads risk inputs typed in the page form or sent to the API, by field name. A missing or blank
 * field takes its default where it has one ({@link RiskSettings#initial()}: each table's most
 * conservative value) and stays unchosen where it has none (the estimate then names it as missing);
 * a value that cannot be used throws {@link InvalidInputException} naming the field, so nothing
 * half-read is ever stored.
 */
final class RiskSettingsParser {

    /** The fields of the whole structure, as the form shows them. */
    static final List<String> FIELDS = List.of("flashDensitySource", "flashDensity", "thunderstormDays", "location",
            "surface", "fireRisk", "fireProvisions", "specialHazard", "structureUse", "lifeCriticalSystems",
            "touchStep", "personsInZone", "personsTotal", "hoursPerYear", "lineCount");

    /**
     * Fields only the API takes: {@code lineLength}, the length of each line given only by the
     * count (earlier clients), and {@code lines}, the array of lines with the {@link #LINE_FIELDS}.
     */
    static final List<String> API_FIELDS = List.of("lineLength", "lines");

    /** The fields of one incoming line; typed as {@code lines[i].field}, i from 0. */
    static final List<String> LINE_FIELDS = List.of("installation", "length", "environment", "transformer",
            "surgeProtection", "shielding", "withstandVoltage", "touchProtection");

    /** Answers to a yes-or-no question. */
    static final String YES = "YES";
    static final String NO = "NO";

    /** Choice value meaning "use the app's suggestion" for the location factor. */
    static final String SUGGESTED = RiskSettings.SUGGESTED_LOCATION;

    static final double MAX_FLASH_DENSITY = 100;
    static final int MAX_LINES = RiskSettings.MAX_LINES;
    static final double MAX_PERSONS = 1e7;
    static final double MAX_LINE_LENGTH = RiskSettings.MAX_LINE_LENGTH;

    private static final Pattern DECIMAL = Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");

    private RiskSettingsParser() {
    }

    /**
     * @param values the text of each field by name; null or blank for "not given"
     * @throws InvalidInputException for the first field that cannot be used
     */
    static RiskSettings parse(Function<String, String> values) {
        RiskSettings d = RiskSettings.initial();
        Double flashDensity = number(values, "flashDensity", false, MAX_FLASH_DENSITY, false);
        Double days = number(values, "thunderstormDays", false, 366, false);
        FlashDensitySource source = choice(values, "flashDensitySource", FlashDensitySource.class, null);
        if (source == null) {
            if (flashDensity != null && days != null) {
                throw new InvalidInputException("flashDensitySource", "give either flashDensity or thunderstormDays,"
                        + " or say which one counts with flashDensitySource (MEASURED or THUNDERSTORM_DAYS)");
            }
            source = flashDensity != null ? FlashDensitySource.MEASURED
                    : days != null ? FlashDensitySource.THUNDERSTORM_DAYS : null;
        }
        if (source == FlashDensitySource.MEASURED) {
            days = null;
        } else {
            flashDensity = null;
        }
        String locationText = text(values, "location");
        boolean suggested = locationText != null && locationText.equalsIgnoreCase(SUGGESTED);
        LocationFactor location = locationText == null || suggested ? null
                : choice(values, "location", LocationFactor.class, null);
        Occupancy occupancy = occupancy(values, d.occupancy());
        Double lineCount = number(values, "lineCount", true, MAX_LINES, true);
        Double lineLength = number(values, "lineLength", false, MAX_LINE_LENGTH, false);
        List<IncomingLine> lines = null;
        if (lineCount != null) {
            lines = new ArrayList<>();
            for (int i = 0; i < lineCount; i++) {
                lines.add(line(values, i, lineLength == null ? RiskSettings.DEFAULT_LINE_LENGTH : lineLength));
            }
        }
        return new RiskSettings(source, flashDensity, days, location, suggested,
                choice(values, "surface", SurfaceType.class, d.surface()),
                choice(values, "fireRisk", FireRisk.class, d.fireRisk()),
                choice(values, "fireProvisions", FireProvisions.class, d.fireProvisions()),
                choice(values, "specialHazard", SpecialHazard.class, d.specialHazard()),
                choice(values, "structureUse", StructureUse.class, d.use()),
                choice(values, "touchStep", TouchStepProtection.class, d.touchStep()),
                occupancy, yesOrNo(values, "lifeCriticalSystems"), lines);
    }

    /** The name a line's field is typed under, e.g. {@code lines[0].length}. */
    static String lineField(int index, String field) {
        return "lines[" + index + "]." + field;
    }

    /** Line {@code i}; a field not given takes its most conservative value, the length {@code length}. */
    private static IncomingLine line(Function<String, String> values, int i, double length) {
        IncomingLine d = StoredLine.conservative(length);
        Double typed = number(values, lineField(i, "length"), false, MAX_LINE_LENGTH, false);
        return new IncomingLine(choice(values, lineField(i, "installation"), LineInstallation.class, d.installation()),
                typed == null ? length : typed,
                choice(values, lineField(i, "environment"), LineEnvironment.class, d.environment()),
                choice(values, lineField(i, "transformer"), LineTransformer.class, d.transformer()),
                choice(values, lineField(i, "surgeProtection"), EntrySurgeProtection.class, d.surgeProtection()),
                choice(values, lineField(i, "shielding"), LineShielding.class, d.shielding()),
                choice(values, lineField(i, "withstandVoltage"), WithstandVoltage.class, d.withstand()),
                choice(values, lineField(i, "touchProtection"), LineTouchProtection.class, d.touchProtection()));
    }

    /** YES, NO (or true, false); null when not given. */
    private static Boolean yesOrNo(Function<String, String> values, String field) {
        String text = text(values, field);
        if (text == null) {
            return null;
        }
        if (text.equalsIgnoreCase(YES) || text.equalsIgnoreCase("true")) {
            return true;
        }
        if (text.equalsIgnoreCase(NO) || text.equalsIgnoreCase("false")) {
            return false;
        }
        throw new InvalidInputException(field, field + " must be " + YES + " or " + NO + ", got \"" + text + "\"");
    }

    /**
     * n_z, n_t and t_z; one left out is taken so that the share exposed stays the largest it can be
     * with the others: n_z = n_t (the whole structure one zone), n_t = n_z, t_z = 8760 h.
     */
    private static Occupancy occupancy(Function<String, String> values, Occupancy d) {
        Double total = number(values, "personsTotal", false, MAX_PERSONS, false);
        Double inZone = number(values, "personsInZone", true, MAX_PERSONS, false);
        Double hours = number(values, "hoursPerYear", true, Occupancy.HOURS_PER_YEAR, false);
        double t = total != null ? total : inZone != null && inZone > 0 ? inZone : d.personsTotal();
        double z = inZone == null ? t : inZone;
        if (z > t) {
            throw new InvalidInputException("personsInZone", "personsInZone (" + plain(z) + ") cannot be more than"
                    + " personsTotal (" + plain(t) + ")");
        }
        return new Occupancy(z, t, hours == null ? d.hoursPerYear() : hours);
    }

    /**
     * A number from 0 (or above 0) to {@code max}; null when not given.
     *
     * @param zeroAllowed whether 0 itself is allowed
     * @param whole whether only whole numbers are allowed
     */
    private static Double number(Function<String, String> values, String field, boolean zeroAllowed, double max,
            boolean whole) {
        String text = text(values, field);
        if (text == null) {
            return null;
        }
        double value = DECIMAL.matcher(text).matches() ? Double.parseDouble(text) : Double.NaN;
        String range = (zeroAllowed ? "from 0" : "above 0") + " to " + plain(max);
        if (!Double.isFinite(value)) {
            throw new InvalidInputException(field, field + " must be a number " + range + ", got \"" + text + "\"");
        }
        if (value < 0 || (value == 0 && !zeroAllowed) || value > max || (whole && value != Math.rint(value))) {
            throw new InvalidInputException(field, field + " must be a" + (whole ? " whole" : "") + " number " + range
                    + ", got " + text);
        }
        return value;
    }

    private static <E extends Enum<E>> E choice(Function<String, String> values, String field, Class<E> type,
            E fallback) {
        String text = text(values, field);
        if (text == null) {
            return fallback;
        }
        for (E e : type.getEnumConstants()) {
            if (e.name().equalsIgnoreCase(text)) {
                return e;
            }
        }
        String allowed = Arrays.stream(type.getEnumConstants()).map(Enum::name).collect(Collectors.joining(", "));
        if ("location".equals(field)) {
            allowed = SUGGESTED + ", " + allowed;
        }
        throw new InvalidInputException(field, field + " must be one of " + allowed + ", got \"" + text + "\"");
    }

    private static String text(Function<String, String> values, String field) {
        String text = values.apply(field);
        return text == null || text.isBlank() ? null : text.strip();
    }

    private static String plain(double value) {
        return value == Math.rint(value) ? String.valueOf((long) value) : String.format(Locale.ROOT, "%s", value);
    }
}

package org.lpzplanner.risk;

import java.util.List;
import org.lpzplanner.engine.io.Json;
import org.lpzplanner.engine.risk.EntrySurgeProtection;
import org.lpzplanner.engine.risk.IncomingLine;
import org.lpzplanner.engine.risk.LineEnvironment;
import org.lpzplanner.engine.risk.LineInstallation;
import org.lpzplanner.engine.risk.LineShielding;
import org.lpzplanner.engine.risk.LineTouchProtection;
import org.lpzplanner.engine.risk.LineTransformer;
import org.lpzplanner.engine.risk.WithstandVoltage;
import tools.jackson.core.type.TypeReference;

/**
 * An incoming line's inputs as stored (column {@code line_details} of {@code site_risk_inputs}, a
 * JSON array) and as a site export carries them: choices by name, the length in metres. The member
 * names are the field names the form and the API use for a line.
 */
public record StoredLine(String installation, double length, String environment, String transformer,
        String surgeProtection, String shielding, String withstandVoltage, String touchProtection) {


    /**
     * A line entered only by its length, as earlier releases stored lines (a count and one length):
     * every other factor at its most conservative value, the one the form starts a line with.
     */
    public static IncomingLine conservative(double length) {
        return new IncomingLine(LineInstallation.OVERHEAD, length, LineEnvironment.RURAL, LineTransformer.NONE,
                EntrySurgeProtection.NONE, LineShielding.UNSHIELDED, WithstandVoltage.KV_1, LineTouchProtection.NONE);
    }

    static StoredLine of(IncomingLine l) {
        return new StoredLine(l.installation().name(), l.length(), l.environment().name(), l.transformer().name(),
                l.surgeProtection().name(), l.shielding().name(), l.withstand().name(), l.touchProtection().name());
    }

    /** The engine's line; the names must be those of the engine's choices (stored lines are checked). */
    IncomingLine toLine() {
        return new IncomingLine(LineInstallation.valueOf(installation), length, LineEnvironment.valueOf(environment),
                LineTransformer.valueOf(transformer), EntrySurgeProtection.valueOf(surgeProtection),
                LineShielding.valueOf(shielding), WithstandVoltage.valueOf(withstandVoltage),
                LineTouchProtection.valueOf(touchProtection));
    }

    /** The JSON array stored for these lines. */
    public static String toJson(List<StoredLine> lines) {
        return Json.MAPPER.writeValueAsString(lines);
    }

    /** The lines of a stored JSON array. */
    public static List<StoredLine> fromJson(String json) {
        return Json.MAPPER.readValue(json, new TypeReference<List<StoredLine>>() { });
    }
}

package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.List;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.common.Formats;
import tools.jackson.databind.JsonNode;

/**
 * The facade bands (or their lower parts) of the stored result where flashes to the side are
 * negligible by IEC 62305-3:2010 5.2.3 and Annex A: structure, wall, length, heights and the height
 * of the building, with the rule in the notes. They are not exposed items: a sphere touches them,
 * but the standard asks no lateral air-termination there. Left out when there are none.
 */
final class SideFlashSchedule {

    static final String TITLE = "Facade bands where flashes to the side are negligible (IEC 62305-3:2010 5.2.3)";

    private SideFlashSchedule() {
    }

    /** The stored result's negligible facade band features, in stored order. */
    static List<JsonNode> negligible(ReportFacts facts) {
        return facts.stored().features().stream()
                .filter(f -> f.path("properties").path("layer").asString("").equals("facade-band"))
                .filter(f -> ResultGeoJson.SIDE_FLASH_NEGLIGIBLE.equals(
                        f.path("properties").path("sideFlash").asString("")))
                .toList();
    }

    static List<ReportBlock> blocks(ReportFacts facts) {
        List<JsonNode> bands = negligible(facts);
        if (bands.isEmpty()) {
            return List.of();
        }
        List<List<String>> rows = new ArrayList<>();
        for (JsonNode f : bands) {
            JsonNode p = f.path("properties");
            rows.add(List.of(p.path("owner").asString(""), String.valueOf(p.path("wall").asInt()),
                    Formats.length(p.path("length").asDouble()), Formats.height(p.path("bottom").asDouble()),
                    Formats.height(p.path("top").asDouble()),
                    p.path("buildingHeight").isNumber() ? Formats.height(p.path("buildingHeight").asDouble()) : ""));
        }
        return List.of(new Schedule(TITLE, List.of("Structure", "Wall", "Length (m)", "From (m)", "To (m)",
                "Building H (m)"), List.of(2.0, 0.6, 0.9, 0.9, 0.9, 1.1), rows, List.of(
                "A sphere touches every wall taller than R from R up to its top, but IEC 62305-3:2010 5.2.3 and"
                        + " Annex A ask for lateral air-termination only on structures taller than 60 m, on the"
                        + " upper part (typically the top 20 % of the height) and on everything above 120 m; on"
                        + " structures lower than 60 m flashes to the side are negligible. Lateral air-termination"
                        + " is therefore needed from min(0.8 H, 120 m) up when H is 60 m or more, nowhere when H is"
                        + " lower than 60 m.",
                "H is the height of the building the wall belongs to: the highest point, roof included, of the"
                        + " structures whose footprints touch or overlap (for a rooftop object, the building it"
                        + " stands on). These bands are drawn on the plan light and dashed; they are not exposed"
                        + " items and need no acceptance. Heights above ground.")));
    }
}

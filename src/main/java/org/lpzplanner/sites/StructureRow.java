package org.lpzplanner.sites;

import java.util.ArrayList;
import java.util.List;
import org.lpzplanner.common.Formats;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Structure;

/**
 * One structure of a stored site as the plan page lists it. Lengths in metres, area in m² (plan),
 * bearing in compass degrees; a value that does not apply to the roof form is null.
 *
 * @param index       0-based position among the site's structures
 * @param roof        {@code flat}, {@code gable}, {@code hip} or {@code shed}
 * @param ridgeHeight ridge (or high side) above ground
 * @param bearing     ridge bearing (gable) or high-side bearing (shed)
 */
public record StructureRow(int index, String id, String name, double footprintArea, double height, String roof,
        Double ridgeHeight, Double bearing, Double parapet) {

    public static List<StructureRow> of(List<Structure> structures) {
        List<StructureRow> rows = new ArrayList<>();
        for (int i = 0; i < structures.size(); i++) {
            Structure s = structures.get(i);
            double area = s.footprint().getArea();
            RoofShape roof = s.roof();
            StructureRow row;
            if (roof instanceof RoofShape.Gable g) {
                row = new StructureRow(i, s.id(), s.name(), area, s.height(), "gable", g.ridgeHeight(),
                        g.ridgeBearing(), null);
            } else if (roof instanceof RoofShape.Hip h) {
                row = new StructureRow(i, s.id(), s.name(), area, s.height(), "hip", h.ridgeHeight(), null, null);
            } else if (roof instanceof RoofShape.Shed sh) {
                row = new StructureRow(i, s.id(), s.name(), area, s.height(), "shed", sh.highHeight(),
                        sh.highSideBearing(), null);
            } else {
                RoofShape.Flat f = (RoofShape.Flat) roof;
                row = new StructureRow(i, s.id(), s.name(), area, s.height(), "flat", null, null, f.parapet());
            }
            rows.add(row);
        }
        return rows;
    }

    /** The footprint as pages and report write an area: "3200.00". */
    public String footprintText() {
        return Formats.area(footprintArea);
    }

    /** The wall top as pages and report write a height: "10.00". */
    public String heightText() {
        return Formats.height(height);
    }

    /** The ridge or high side as a height, null where the roof has none. */
    public String ridgeHeightText() {
        return ridgeHeight == null ? null : Formats.height(ridgeHeight);
    }

    /** The parapet as a height, null where the roof has none. */
    public String parapetText() {
        return parapet == null ? null : Formats.height(parapet);
    }
}

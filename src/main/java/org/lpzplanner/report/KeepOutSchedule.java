package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.common.Formats;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;

/**
 * The site's keep-out areas, numbered K1, K2, … as the plan numbers them: name, plan area, corners
 * and the revision's air-termination parts that stand inside one (a rod on or inside the outline,
 * a conductor touching it), which the designer must move or confirm with whoever uses the area.
 * The areas belong to the site, not to the revision: printed as stored when printed. Nothing is
 * printed without stored site data (the command line).
 */
final class KeepOutSchedule {

    static final String TITLE = "Keep-out areas";

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private KeepOutSchedule() {
    }

    /** "K1" for the first area. */
    static String number(int index) {
        return "K" + (index + 1);
    }

    static List<ReportBlock> blocks(ReportFacts facts) {
        StoredDesign design = facts.design();
        if (design.readAt() == null) {
            return List.of();
        }
        List<StoredDesign.KeepOutArea> areas = design.keepOutAreas();
        if (areas.isEmpty()) {
            return List.of(new ReportBlock.Heading(TITLE, 2), new ReportBlock.Paragraph("No keep-out areas are"
                    + " stored for the site (" + design.asStored() + ")."));
        }
        List<List<String>> rows = new ArrayList<>();
        int conflicts = 0;
        for (int i = 0; i < areas.size(); i++) {
            StoredDesign.KeepOutArea a = areas.get(i);
            List<String> inside = partsInside(facts, polygon(a.corners()));
            conflicts += inside.size();
            List<String> corners = new ArrayList<>();
            for (double[] c : a.corners()) {
                corners.add("(" + Formats.coordinate(c[0]) + ", " + Formats.coordinate(c[1]) + ")");
            }
            rows.add(List.of(number(i), a.name(), Formats.area(a.area()), String.join(" ", corners),
                    inside.isEmpty() ? "none" : String.join(", ", inside)));
        }
        List<String> notes = new ArrayList<>();
        notes.add("Roof areas where no air-termination may stand (for example skylights, walkways, plant access,"
                + " solar panels), hatched on the plan; corners in local metres (x east, y north), area in plan. As"
                + design.asStored().substring("as".length()) + ".");
        notes.add("Proposals place no part inside a stored keep-out area. \"Parts inside\" lists the parts of this"
                + " revision's site file that stand on or inside the outline (rods) or touch it (conductors)"
                + (conflicts == 0 ? ": none do." : ": move them, or confirm with whoever uses the area."));
        return List.of(new Schedule(TITLE, List.of("No.", "Name", "Area (m²)", "Corners (m)", "Parts inside"),
                List.of(0.5, 1.8, 0.8, 4.0, 1.1), rows, notes));
    }

    private static List<String> partsInside(ReportFacts facts, Polygon area) {
        List<String> out = new ArrayList<>();
        for (Rod r : facts.site().rods()) {
            if (area.covers(GEOMETRY.createPoint(new Coordinate(r.x(), r.y())))) {
                out.add(facts.partNumbers().get(r.id()));
            }
        }
        for (Conductor c : facts.site().conductors()) {
            Coordinate[] line = c.path().stream().map(p -> new Coordinate(p.x, p.y)).toArray(Coordinate[]::new);
            boolean touches = line.length == 1 ? area.covers(GEOMETRY.createPoint(line[0]))
                    : area.intersects(GEOMETRY.createLineString(line));
            if (touches) {
                out.add(facts.partNumbers().get(c.id()));
            }
        }
        return out;
    }

    private static Polygon polygon(List<double[]> corners) {
        Coordinate[] ring = new Coordinate[corners.size() + 1];
        for (int i = 0; i < corners.size(); i++) {
            ring[i] = new Coordinate(corners.get(i)[0], corners.get(i)[1]);
        }
        ring[corners.size()] = ring[0].copy();
        return GEOMETRY.createPolygon(ring);
    }
}

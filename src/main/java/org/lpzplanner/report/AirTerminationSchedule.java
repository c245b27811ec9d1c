package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.common.Formats;
import org.lpzplanner.engine.geom.SiteSurface;

/**
 * The air-termination parts of the site file: number, type, name, plan position, height, what each
 * stands on, its top and whether it intercepts any sphere.
 */
final class AirTerminationSchedule {

    static final String TITLE = "Schedule of air-termination parts";

    private AirTerminationSchedule() {
    }

    static List<ReportBlock> blocks(ReportFacts facts) {
        List<List<String>> rows = new ArrayList<>();
        for (SiteSurface.PlacedRod r : facts.surface().rods()) {
            String on = facts.standsOn(r.rod().x(), r.rod().y());
            boolean mast = on == null;
            rows.add(List.of(facts.partNumbers().get(r.rod().id()), mast ? "mast" : "rod", name(r.rod().name(),
                    r.rod().id()), Formats.coordinate(r.rod().x()), Formats.coordinate(r.rod().y()),
                    Formats.height(r.rod().height()),
                    mast ? "ground" : on, Formats.height(r.tip().getZ()), intercepts(facts, r.rod().id())));
        }
        for (SiteSurface.PlacedConductor c : facts.surface().conductors()) {
            Coordinate start = c.path().get(0);
            String on = facts.standsOn(start.x, start.y);
            double top = c.path().stream().mapToDouble(Coordinate::getZ).max().orElse(0);
            String height = c.conductor().followsSurface() ? Formats.height(c.conductor().heightAboveRoof()) + " above surface"
                    : "elevations given";
            rows.add(List.of(facts.partNumbers().get(c.conductor().id()), "conductor, " + Formats.length(length(c.path()))
                    + " m", name(c.conductor().name(), c.conductor().id()), Formats.coordinate(start.x), Formats.coordinate(start.y), height,
                    on == null ? "free span / ground" : on, Formats.height(top), intercepts(facts, c.conductor().id())));
        }
        if (rows.isEmpty()) {
            return List.of(new ReportBlock.Heading(TITLE, 2),
                    new ReportBlock.Paragraph("The site file holds no air-termination parts."));
        }
        return List.of(new Schedule(TITLE,
                List.of("No.", "Type", "Name", "x (m)", "y (m)", "Height (m)", "Stands on", "Top (m)", "Intercepts"),
                List.of(0.5, 1.1, 1.6, 0.8, 0.8, 1.0, 1.5, 0.8, 0.9), rows,
                List.of("Positions in local metres (x east, y north); a conductor's position is its first vertex."
                        + " Height is above what the part stands on; top is above ground."
                        + " \"Intercepts\" tells whether a rolling sphere touches the part.")));
    }

    private static String intercepts(ReportFacts facts, String id) {
        return facts.stored().intercepting().contains(id) ? "yes" : "no";
    }

    private static String name(String name, String id) {
        return name == null || name.isBlank() ? id : name;
    }

    private static double length(List<Coordinate> path) {
        double total = 0;
        for (int i = 1; i < path.size(); i++) {
            total += path.get(i - 1).distance3D(path.get(i));
        }
        return total;
    }
}

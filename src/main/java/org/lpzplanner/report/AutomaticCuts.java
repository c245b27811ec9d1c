package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.List;
import org.lpzplanner.engine.model.Structure;

/**
 * One section cut per structure through its worst exposed point: the highest point of its exposed
 * edges, corners and facade bands (an exposed roof area when it has nothing else), running across
 * the edge (diagonally through a corner, east-west through a roof area) and reaching one sphere
 * radius beyond the structure on each side. Structures with nothing exposed get no cut.
 */
final class AutomaticCuts {

    /** A cut for one structure with the point it passes through. */
    record StructureCut(Structure structure, StoredResult.Marked through, ReportSource.Cut cut) {
    }

    private AutomaticCuts() {
    }

    static List<StructureCut> of(ReportFacts facts) {
        List<StructureCut> cuts = new ArrayList<>();
        double radius = facts.source().sphere().radius();
        for (Structure s : facts.site().structures()) {
            StoredResult.Marked worst = null;
            for (StoredResult.Marked m : facts.stored().highPoints()) {
                if (m.owner().equals(s.name()) && (worst == null || m.z() > worst.z())) {
                    worst = m;
                }
            }
            if (worst == null) {
                continue;
            }
            // The cut spans the structure's extent along its direction, plus one radius on each side.
            double from = 0, to = 0;
            for (var c : s.footprint().getEnvelope().getCoordinates()) {
                double t = (c.x - worst.x()) * worst.dirX() + (c.y - worst.y()) * worst.dirY();
                from = Math.min(from, t);
                to = Math.max(to, t);
            }
            from -= radius;
            to += radius;
            cuts.add(new StructureCut(s, worst, new ReportSource.Cut(s.name(), worst.x() + worst.dirX() * from,
                    worst.y() + worst.dirY() * from, worst.x() + worst.dirX() * to, worst.y() + worst.dirY() * to)));
        }
        return cuts;
    }
}

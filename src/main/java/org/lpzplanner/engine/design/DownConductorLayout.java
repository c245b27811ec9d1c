package org.lpzplanner.engine.design;

import java.util.List;
import org.locationtech.jts.geom.Coordinate;

/**
 * Planned (or edited) down-conductors of one building.
 *
 * @param building        the building (its structures and outline)
 * @param perimeter       total length of the rings that carry down-conductors (outer rings, courtyards
 *                        over 30 m), metres
 * @param typicalSpacing  the level's typical spacing, metres
 * @param required        the count the rule asks for: per ring max(2, ⌈length / typical spacing⌉), summed
 * @param positions       plan points on those rings, ring by ring, in ring order
 * @param largestSpacing  longest distance along a ring between neighbouring positions, metres
 */
public record DownConductorLayout(Building building, double perimeter, double typicalSpacing, int required,
        List<Coordinate> positions, double largestSpacing) {

    public DownConductorLayout {
        positions = List.copyOf(positions);
    }

    /** The building's id (its first structure's id). */
    public String buildingId() {
        return building.id();
    }

    public int count() {
        return positions.size();
    }

    /**
     * True when some gap between neighbouring positions is longer than the typical spacing: corners
     * are kept, so an irregular outline can leave one gap long although the count is enough on average.
     */
    public boolean exceedsTypicalSpacing() {
        return largestSpacing > typicalSpacing + 1e-9;
    }

    /** Perimeter over count: the average spacing achieved, metres. */
    public double meanSpacing() {
        return positions.isEmpty() ? 0 : perimeter / positions.size();
    }
}

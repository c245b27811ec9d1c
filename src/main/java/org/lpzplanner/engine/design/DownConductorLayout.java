package org.lpzplanner.engine.design;

import java.util.List;
import org.locationtech.jts.geom.Coordinate;

/**
 * Planned down-conductors of one structure.
 *
 * @param structureId     the structure
 * @param perimeter       total length of the footprint's outer rings, metres
 * @param typicalSpacing  the level's typical spacing, metres
 * @param positions       plan points on the outer rings, ring by ring, in ring order
 * @param largestSpacing  longest distance along a ring between neighbouring positions, metres
 */
public record DownConductorLayout(String structureId, double perimeter, double typicalSpacing,
        List<Coordinate> positions, double largestSpacing) {

    public DownConductorLayout {
        positions = List.copyOf(positions);
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

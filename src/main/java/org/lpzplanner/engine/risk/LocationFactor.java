package org.lpzplanner.engine.risk;

import java.util.List;

/**
 * Location factor C_D: how the surroundings change the number of flashes to a structure
 * [IEC 62305-2:2010 Table A.1].
 */
public enum LocationFactor {
    /** Surrounded by higher objects or trees. */
    SURROUNDED_BY_HIGHER(0.25),
    /** Surrounded by objects or trees of the same or lower height. */
    SURROUNDED_BY_SAME_OR_LOWER(0.5),
    /** No other objects in the vicinity. */
    ISOLATED(1),
    /** Isolated on a hilltop or a knoll. */
    ISOLATED_ON_HILLTOP(2);

    private final double value;

    LocationFactor(double value) {
        this.value = value;
    }

    /** C_D. */
    public double value() {
        return value;
    }

    /**
     * A starting point for the user's choice from the heights of neighbouring objects. The standard
     * names the classes but gives no rule; this one follows the common practice of judging only
     * objects within 3·H of the structure (H its height), and is ours where the practice is silent:
     * <ul>
     *   <li>fewer than two objects within 3·H: {@link #ISOLATED} (the pairs carry no bearing, and one
     *       object cannot surround a structure);</li>
     *   <li>two or more, all higher than H: {@link #SURROUNDED_BY_HIGHER};</li>
     *   <li>two or more, any of them not higher than H: {@link #SURROUNDED_BY_SAME_OR_LOWER}.</li>
     * </ul>
     * Mixed surroundings thus get the larger factor (more dangerous events). {@link #ISOLATED_ON_HILLTOP}
     * is never suggested: it needs the terrain, which the site does not hold.
     *
     * @param structureHeight H in metres, &gt; 0
     * @param neighbours objects near the structure; those farther than 3·H are ignored
     */
    public static LocationFactor suggest(double structureHeight, List<Neighbour> neighbours) {
        if (!(structureHeight > 0) || Double.isInfinite(structureHeight)) {
            throw new IllegalArgumentException("structure height must be a positive number of metres, got " + structureHeight);
        }
        double reach = CollectionAreaOp.HEIGHT_FACTOR * structureHeight;
        int near = 0;
        int higher = 0;
        for (Neighbour n : neighbours) {
            if (n.distance() <= reach) {
                near++;
                if (n.height() > structureHeight) {
                    higher++;
                }
            }
        }
        if (near < 2) {
            return ISOLATED;
        }
        return higher == near ? SURROUNDED_BY_HIGHER : SURROUNDED_BY_SAME_OR_LOWER;
    }
}

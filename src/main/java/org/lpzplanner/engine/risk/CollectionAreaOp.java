package org.lpzplanner.engine.risk;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.operation.buffer.BufferOp;
import org.locationtech.jts.operation.buffer.BufferParameters;
import org.locationtech.jts.operation.union.UnaryUnionOp;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * Collection area A_D of the real site geometry: the ground area within horizontal distance 3·h of
 * each part of each structure, h being that part's height [IEC 62305-2:2010 Annex A]. For an
 * isolated rectangular structure this reduces to {@link #rectangleFormula}.
 *
 * <p><b>Parts and their heights.</b> Each structure is one part at {@link Structure#topHeight()}:
 * for a flat roof the wall top plus parapet; for a pitched roof (gable, hip, shed) the whole
 * footprint at the highest point of the roof. The exact rule would give each point of a pitched
 * roof a distance of three times its own height, so a pitched roof's zone here is larger than the
 * exact one (conservative: more dangerous events). A stepped building is modelled as several
 * structures; each step keeps its own height. {@link #of(Site)} also counts every rooftop object as
 * a part at its top height (a chimney or plant box raises the zone locally, as Annex A does for a
 * prominent part of a structure).
 *
 * <p><b>Approximation.</b> Each part's zone is a JTS buffer of its footprint by 3·h with
 * {@value #QUADRANT_SEGMENTS} segments per quadrant, and the zones are merged with
 * {@link UnaryUnionOp}. A buffer's round joins are chords whose vertices lie on the exact circle
 * (inscribed), so the result is never larger than the exact zone. A chord spanning angle α cuts off
 * a circular segment that is the fraction 1 − sin α / α of its sector; the sectors of the arcs that
 * remain on the outline are disjoint parts of the zone, so the relative area error is at most
 * 1 − sin α_max / α_max. JTS divides a corner of turning angle θ into round(θ / q) equal steps,
 * q = π / (2·{@value #QUADRANT_SEGMENTS}), so every step is below 1.5·q: α_max &lt; 1.5·π/96 and the
 * bound is {@link #MAX_RELATIVE_ERROR} ≈ 4.0·10⁻⁴ (0.04 %). For right-angled corners every step is
 * exactly q, and the bound is 1 − sin q / q ≈ 1.8·10⁻⁴.
 *
 * <p>Stateless and thread-safe. Cost: one buffer per part and one union, O(n log n) in the number of
 * vertices.
 */
public final class CollectionAreaOp {

    /** Segments per quarter circle of each buffer. */
    public static final int QUADRANT_SEGMENTS = 48;

    /** The distance from a part, as a multiple of its height [IEC 62305-2:2010 Annex A]. */
    public static final double HEIGHT_FACTOR = 3.0;

    private static final double LARGEST_STEP = 1.5 * Math.PI / (2 * QUADRANT_SEGMENTS);

    /** Upper bound of (exact − computed) / exact for any site; derivation in the class comment. */
    public static final double MAX_RELATIVE_ERROR = 1 - Math.sin(LARGEST_STEP) / LARGEST_STEP;

    private CollectionAreaOp() {
    }

    /**
     * Collection area of every structure and rooftop object of the site. An empty site has area 0.
     *
     * @throws IllegalArgumentException when a height is negative or not finite
     */
    public static CollectionArea of(Site site) {
        List<Geometry> zones = new ArrayList<>();
        for (Structure s : site.structures()) {
            zones.add(zone(s.footprint(), s.topHeight(), s.id()));
        }
        for (RooftopObject o : site.rooftopObjects()) {
            zones.add(zone(o.footprint(), o.top(), o.id()));
        }
        return union(zones);
    }

    /** Collection area of the given structures alone (no rooftop objects). */
    public static CollectionArea ofStructures(List<Structure> structures) {
        List<Geometry> zones = new ArrayList<>();
        for (Structure s : structures) {
            zones.add(zone(s.footprint(), s.topHeight(), s.id()));
        }
        return union(zones);
    }

    /**
     * A_D = L·W + 2·(3H)·(L + W) + π·(3H)², exact for an isolated rectangular structure of length L,
     * width W and height H in metres [IEC 62305-2:2010 Annex A].
     */
    public static double rectangleFormula(double length, double width, double height) {
        double r = HEIGHT_FACTOR * height;
        return length * width + 2 * r * (length + width) + Math.PI * r * r;
    }

    private static Geometry zone(Geometry footprint, double height, String id) {
        if (!(height >= 0) || Double.isInfinite(height)) {
            throw new IllegalArgumentException("height of " + id + " must be a finite number of metres >= 0, got " + height);
        }
        return BufferOp.bufferOp(footprint, HEIGHT_FACTOR * height, new BufferParameters(QUADRANT_SEGMENTS));
    }

    private static CollectionArea union(List<Geometry> zones) {
        Geometry merged = zones.isEmpty() ? new GeometryFactory().createPolygon() : UnaryUnionOp.union(zones);
        return new CollectionArea(merged.getArea(), merged, MAX_RELATIVE_ERROR);
    }
}

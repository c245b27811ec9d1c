package org.lpzplanner.engine.design.proposal;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * The number of rods a plain regular layout at the level's mesh size m (5, 10, 15, 20 m for I to IV,
 * IEC 62305-3:2010 Table 2) would use: the yardstick a proposal is compared with.
 *
 * <p>Per structure footprint (each polygon part): a rod at every vertex of every ring (outer ring and
 * courtyards) and along every side at most m apart (⌈side / m⌉ rods per side, the vertices included
 * once), plus a rod at each node of a square grid of spacing m (aligned with the part's bounding
 * box, starting m from its lower-left corner) that lies inside the footprint at least m/2 from its
 * outline. It is a count for comparison only: whether that layout would protect the site is not
 * checked. Rooftop objects get nothing.
 */
public final class RegularLayout {

    private static final GeometryFactory GF = new GeometryFactory();

    private RegularLayout() {
    }

    /** Rods of the regular layout for the whole site. */
    public static int count(Site site, double meshSize) {
        int n = 0;
        for (Structure s : site.structures()) {
            n += count(s.footprint(), meshSize);
        }
        return n;
    }

    /** Rods of the regular layout for one footprint. */
    public static int count(Geometry footprint, double meshSize) {
        if (!(meshSize > 0)) {
            throw new IllegalArgumentException("mesh size must be positive, got " + meshSize);
        }
        int n = 0;
        for (int k = 0; k < footprint.getNumGeometries(); k++) {
            Polygon part = (Polygon) footprint.getGeometryN(k);
            n += outline(part.getExteriorRing(), meshSize);
            for (int h = 0; h < part.getNumInteriorRing(); h++) {
                n += outline(part.getInteriorRingN(h), meshSize);
            }
            n += interior(part, meshSize);
        }
        return n;
    }

    private static int outline(LinearRing ring, double m) {
        Coordinate[] cs = ring.getCoordinates();
        int n = 0;
        for (int i = 1; i < cs.length; i++) {
            double side = cs[i - 1].distance(cs[i]);
            if (side > 1e-9) {
                n += Math.max(1, (int) Math.ceil(side / m - 1e-9));
            }
        }
        return n;
    }

    private static int interior(Polygon part, double m) {
        Envelope e = part.getEnvelopeInternal();
        PreparedGeometry inner = PreparedGeometryFactory.prepare(part);
        Geometry outline = part.getBoundary();
        int n = 0;
        for (double x = e.getMinX() + m; x < e.getMaxX(); x += m) {
            for (double y = e.getMinY() + m; y < e.getMaxY(); y += m) {
                Geometry p = GF.createPoint(new Coordinate(x, y));
                if (inner.contains(p) && outline.distance(p) >= m / 2 - 1e-9) {
                    n++;
                }
            }
        }
        return n;
    }
}

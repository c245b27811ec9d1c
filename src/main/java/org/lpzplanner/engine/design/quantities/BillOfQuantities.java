package org.lpzplanner.engine.design.quantities;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.design.DownConductorTops;
import org.lpzplanner.engine.geom.EdgeKind;
import org.lpzplanner.engine.geom.RoofEdge;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.Site;

/**
 * Quantities an installer orders for the air-termination and down-conductors of a site.
 *
 * <ul>
 * <li>Rods by height (standing on a roof or rooftop object) and masts by height (standing on the ground).</li>
 * <li>Conductor lengths (3D, metres) by kind: a leg up to {@value #ROOF_RISE} m above the surface under
 *     both its ends is a roof conductor, or a ridge conductor when it runs within
 *     {@value #RIDGE_REACH} m of a ridge or hip in plan; higher legs are catenary wires.</li>
 * <li>Down-conductors: one per position, from the air-termination level at the top of the wall there
 *     ({@link DownConductorTops}: the parapet's top, the eaves, the verge of a gable end at that point,
 *     or a roof conductor passing there) straight down to ground level. The connection from ground
 *     level to the earth termination and any detour of the installed route are not included.</li>
 * <li>Fixings: the rate per metre times the roof, ridge and down-conductor lengths, rounded up
 *     (catenary wires hang between their supports and get none).</li>
 * <li>One test joint and one earth termination per down-conductor (common practice).</li>
 * </ul>
 * Stateless and thread-safe.
 */
public final class BillOfQuantities {

    public static final double ROOF_RISE = DownConductorTops.ROOF_CONDUCTOR_RISE;
    public static final double RIDGE_REACH = 0.5;

    private BillOfQuantities() {
    }

    /** The quantities as numbers, for arithmetic and for the table. */
    public record Quantities(Map<Double, Integer> rodsByHeight, Map<Double, Integer> mastsByHeight, double roofConductor,
            double ridgeConductor, double catenary, double downConductor, int downConductors, int fixings,
            int testJoints, int earthTerminations, double fixingsPerMetre) {
    }

    /**
     * @param downConductorPositions every planned down-conductor position (plan, local metres)
     * @param fixingsPerMetre        fixings per metre of roof, ridge and down-conductor, e.g. 1
     */
    public static Quantities compute(Site site, List<Coordinate> downConductorPositions, double fixingsPerMetre) {
        if (!(fixingsPerMetre >= 0) || fixingsPerMetre > 20) {
            throw new IllegalArgumentException("fixings per metre must be between 0 and 20, got " + fixingsPerMetre);
        }
        SiteSurface surface = SiteSurfaceBuilder.build(site);
        Map<Double, Integer> rods = new TreeMap<>();
        Map<Double, Integer> masts = new TreeMap<>();
        for (SiteSurface.PlacedRod r : surface.rods()) {
            (r.base() > 0 ? rods : masts).merge(r.rod().height(), 1, Integer::sum);
        }
        double roof = 0, ridge = 0, catenary = 0;
        for (SiteSurface.PlacedConductor c : surface.conductors()) {
            List<Coordinate> p = c.path();
            for (int i = 1; i < p.size(); i++) {
                Coordinate a = p.get(i - 1), b = p.get(i);
                double length = a.distance3D(b);
                boolean low = DownConductorTops.isRoofLeg(surface, a, b);
                if (!low) {
                    catenary += length;
                } else if (alongRidge(surface, a, b)) {
                    ridge += length;
                } else {
                    roof += length;
                }
            }
        }
        Set<String> structures = new HashSet<>();
        site.structures().forEach(st -> structures.add(st.id()));
        double down = 0;
        for (Coordinate c : downConductorPositions) {
            Coordinate top = DownConductorTops.top(surface, structures, c);
            down += top == null ? 0 : top.getZ();
        }
        int n = downConductorPositions.size();
        int fixings = (int) Math.ceil((roof + ridge + down) * fixingsPerMetre - 1e-9);
        return new Quantities(rods, masts, roof, ridge, catenary, down, n, fixings, n, n, fixingsPerMetre);
    }

    /** The quantities as a table: item, unit, quantity, basis. */
    public static QuantityTable table(Quantities q) {
        List<List<String>> rows = new ArrayList<>();
        q.rodsByHeight().forEach((h, n) -> rows.add(List.of("Air-termination rod " + metres(h) + " m", "pcs",
                String.valueOf(n), "on a roof or rooftop object")));
        q.mastsByHeight().forEach((h, n) -> rows.add(List.of("Free-standing mast " + metres(h) + " m", "pcs",
                String.valueOf(n), "on the ground")));
        rows.add(List.of("Roof conductor", "m", metres(q.roofConductor()), "3D length of legs on the roof"));
        rows.add(List.of("Ridge conductor", "m", metres(q.ridgeConductor()), "3D length of legs along ridges and hips"));
        rows.add(List.of("Catenary wire", "m", metres(q.catenary()), "legs higher than " + metres(ROOF_RISE) + " m above the surface"));
        rows.add(List.of("Down-conductor", "m", metres(q.downConductor()),
                q.downConductors() + " down-conductors, from the air-termination at the wall top (parapet, eaves or"
                        + " verge) straight down to ground level; connection to the earth termination not included"));
        rows.add(List.of("Conductor fixing", "pcs", String.valueOf(q.fixings()),
                metres(q.fixingsPerMetre()) + " per metre of roof, ridge and down-conductor"));
        rows.add(List.of("Test joint", "pcs", String.valueOf(q.testJoints()), "one per down-conductor"));
        rows.add(List.of("Earth termination", "pcs", String.valueOf(q.earthTerminations()), "one per down-conductor"));
        return new QuantityTable("Bill of quantities", List.of("Item", "Unit", "Quantity", "Basis"), rows);
    }

    private static boolean alongRidge(SiteSurface surface, Coordinate a, Coordinate b) {
        for (RoofEdge e : surface.edges()) {
            if ((e.kind() == EdgeKind.RIDGE || e.kind() == EdgeKind.HIP) && near(e, a) && near(e, b)) {
                return true;
            }
        }
        return false;
    }

    private static boolean near(RoofEdge e, Coordinate p) {
        Coordinate s = e.p0(), t = e.p1();
        double vx = t.x - s.x, vy = t.y - s.y, len2 = vx * vx + vy * vy;
        double k = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((p.x - s.x) * vx + (p.y - s.y) * vy) / len2));
        return Math.hypot(p.x - (s.x + k * vx), p.y - (s.y + k * vy)) <= RIDGE_REACH;
    }

    /** A length or height in metres as short text: 2 decimals at most, no trailing zeros. */
    public static String metresText(double v) {
        return metres(v);
    }

    static String metres(double v) {
        return String.format(Locale.ROOT, "%.2f", v).replaceAll("\\.?0+$", "");
    }
}

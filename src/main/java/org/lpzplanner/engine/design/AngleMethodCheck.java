package org.lpzplanner.engine.design;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.geom.EdgeKind;
import org.lpzplanner.engine.geom.PlanPolygon;
import org.lpzplanner.engine.geom.RoofEdge;
import org.lpzplanner.engine.geom.RoofFace;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.geom.SurfaceKind;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * Protective angle method [IEC 62305-3:2010 5.2.2 and Annex A]: does the site's rods' cones cover a
 * structure's roof?
 *
 * <p><b>Rule.</b> A roof point p at elevation z is covered when, for some rod with tip T,
 * horizontal distance(p, T) ≤ (T<sub>z</sub> − z) · tan α(h), with α from {@link ProtectiveAngle}
 * and h the rod's height above the reference plane for p. The reference plane is the surface the rod
 * stands on (so h is the rod's own height) for points at or above the rod's base; for a point lower
 * than the base (a lower roof, the ground) it is the point's own level, h = T<sub>z</sub> − z, as the
 * standard's figure for a rod on a roof does with h<sub>2</sub> = h<sub>1</sub> + H [IEC 62305-3:2010
 * Annex A, from memory]. A rod whose h exceeds the sphere radius does not take part for that point
 * (the method does not apply there) and is named in the notes.
 *
 * <p><b>Sampling (approximate).</b> Every roof face of the structure is sampled at the centres of a
 * {@value #GRID_SPACING} m grid, plus every face corner and points at most {@value #GRID_SPACING} m
 * apart along the structure's roof edges, parapets, ridges and hips (at their true height, so a
 * parapet is tested at its top). A gap smaller than the grid between sample points can be missed;
 * the uncovered area is a grid-cell count.
 *
 * <p><b>Limits of the method.</b> Only vertical rods count: roof conductors and catenary wires (whose
 * protected space is a wedge, not a cone) are ignored, so a roof covered by them shows as uncovered.
 * Rooftop objects are not tested and do not shield. Walls are not tested: the angle method says
 * nothing about side flashes to tall facades. The angle method is a simplification of the rolling
 * sphere and may disagree with it, most near h = R and on pitched or stepped roofs; the rolling
 * sphere result governs.
 *
 * <p>Cost: O(sample points × rods). Stateless and thread-safe.
 */
public final class AngleMethodCheck {

    /** Largest distance between sample points, metres. */
    public static final double GRID_SPACING = 0.5;

    private static final double EPS = 1e-9;

    private AngleMethodCheck() {
    }

    /** Coverage of every structure of the site by its rods, for the level's sphere radius. */
    public static List<AngleCoverage> check(Site site, ProtectionLevel level) {
        SiteSurface surface = SiteSurfaceBuilder.build(site);
        List<AngleCoverage> out = new ArrayList<>();
        for (Structure s : site.structures()) {
            out.add(check(surface, s.id(), level.sphereRadius()));
        }
        return out;
    }

    /** Coverage of the roof of the structure {@code structureId} of a built surface. */
    public static AngleCoverage check(SiteSurface surface, String structureId, double sphereRadius) {
        Set<String> notes = new LinkedHashSet<>();
        List<Coordinate> uncovered = new ArrayList<>();
        int sampled = 0;
        int uncoveredCells = 0;
        String name = structureId;
        for (int i = 0; i < surface.faces().size(); i++) {
            RoofFace face = surface.faces().get(i);
            if (face.kind() != SurfaceKind.ROOF || !face.ownerId().equals(structureId)) {
                continue;
            }
            name = face.ownerName();
            PlanPolygon plan = surface.facePolygon(i);
            for (double x = plan.minX() + GRID_SPACING / 2; x < plan.maxX(); x += GRID_SPACING) {
                for (double y = plan.minY() + GRID_SPACING / 2; y < plan.maxY(); y += GRID_SPACING) {
                    if (plan.contains(x, y)) {
                        sampled++;
                        Coordinate p = new Coordinate(x, y, face.plane().z(x, y));
                        if (!isCovered(surface, p, sphereRadius, notes)) {
                            uncovered.add(p);
                            uncoveredCells++;
                        }
                    }
                }
            }
            for (Coordinate c : face.polygon().getExteriorRing().getCoordinates()) {
                sampled++;
                Coordinate p = new Coordinate(c.x, c.y, face.plane().z(c.x, c.y));
                if (!isCovered(surface, p, sphereRadius, notes)) {
                    uncovered.add(p);
                }
            }
        }
        for (RoofEdge e : surface.edges()) {
            if (!e.ownerId().equals(structureId) || e.kind() == EdgeKind.OBJECT_EDGE) {
                continue;
            }
            int steps = Math.max(1, (int) Math.ceil(e.planLength() / GRID_SPACING));
            for (int k = 0; k <= steps; k++) {
                double t = (double) k / steps;
                sampled++;
                Coordinate p = new Coordinate(e.p0().x + t * (e.p1().x - e.p0().x), e.p0().y + t * (e.p1().y - e.p0().y),
                        e.p0().getZ() + t * (e.p1().getZ() - e.p0().getZ()));
                if (!isCovered(surface, p, sphereRadius, notes)) {
                    uncovered.add(p);
                }
            }
        }
        return new AngleCoverage(structureId, name, sampled, uncovered,
                uncoveredCells * GRID_SPACING * GRID_SPACING, new ArrayList<>(notes));
    }

    /** True when some rod's cone contains p; rods the method does not apply to are noted. */
    static boolean isCovered(SiteSurface surface, Coordinate p, double sphereRadius, Set<String> notes) {
        for (SiteSurface.PlacedRod r : surface.rods()) {
            Coordinate tip = r.tip();
            double depth = tip.getZ() - p.getZ();
            if (depth < -EPS) {
                continue;
            }
            double heightAboveReference = tip.getZ() - Math.min(r.base(), p.getZ());
            if (heightAboveReference > sphereRadius) {
                notes.add("rod " + r.rod().id() + " stands " + round(heightAboveReference) + " m above the reference plane of"
                        + " some roof points, more than the sphere radius " + round(sphereRadius)
                        + " m: the protective angle method does not apply there and the rod is left out for those points");
                continue;
            }
            if (!(heightAboveReference > 0)) {
                continue;
            }
            double reach = Math.max(0, depth) * ProtectiveAngle.tangent(sphereRadius, heightAboveReference);
            if (Math.hypot(p.x - tip.x, p.y - tip.y) <= reach + EPS) {
                return true;
            }
        }
        return false;
    }

    private static String round(double v) {
        return String.format(java.util.Locale.ROOT, "%.1f", v);
    }
}

package org.lpzplanner.engine.exposure;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Point;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * Which parts of the facade bands need lateral air-termination: the tall-structure rule of
 * IEC 62305-3:2010 5.2.3 and Annex A.
 *
 * <p>A sphere touches every wall taller than R from R up to its top ({@link FacadeBand}), but the
 * standard does not ask for air-termination on all of that: on structures lower than 60 m flashes
 * to the side are negligible (Annex A); on structures taller than 60 m the upper part, typically the
 * top 20 % of the height, needs lateral air-termination, and so do all parts above 120 m (5.2.3).
 * With H the height of the building, lateral air-termination is therefore needed from
 * {@code min(0.8·H, 120 m)} upwards when H ≥ 60 m, and nowhere when H &lt; 60 m
 * ({@link #lateralFrom}). A structure of exactly 60 m is taken as taller: the boundary errs toward
 * "needs". Each band keeps its geometry and is split at that height into a part where flashes to
 * the side are negligible (below) and a part that needs lateral air-termination (above); a band
 * wholly on one side is one part.
 *
 * <p>H is the height of the building as a whole: the highest point, roof included, of the
 * structures whose footprints touch or overlap one another (within 1 mm), the same union the
 * engine treats as one solid; a structure given as several footprint parts is one structure.
 * Rooftop objects do not raise it. A rooftop object's band takes the H of the building it stands on
 * (the structure covering the object's interior point, as the surface builder places it); an object
 * standing on no structure counts as a building of its own height.
 *
 * <p>The rule only classifies: bands that need lateral air-termination count as exposed
 * ({@link AnalysisResult#isFullyProtected()}); negligible ones are listed apart. Band heights are
 * those of the engine (bottoms at most 0.05 m low); split heights are exact.
 *
 * <p>Stateless and thread-safe. Grouping costs O(n²) envelope tests in the number of structures
 * (exact tests only for overlapping envelopes).
 */
public final class SideFlashRule {

    /** Structures lower than this (m) take no flashes to the side worth protecting (Annex A). */
    public static final double TALL = 60;

    /** Share of a tall structure's height, from the top, that needs lateral air-termination (5.2.3). */
    public static final double UPPER_SHARE = 0.2;

    /** Everything above this height (m) needs lateral air-termination (5.2.3). */
    public static final double ALWAYS_ABOVE = 120;

    /** The clause the rule follows. */
    public static final String CLAUSE = "IEC 62305-3:2010 5.2.3";

    /** Footprints closer than this (m) touch. */
    private static final double TOUCH = 1e-3;

    private SideFlashRule() {
    }

    /** What the standard asks for a part of a facade band. */
    public enum Need {
        /** Flashes to the side are negligible here: no lateral air-termination needed. */
        NEGLIGIBLE,
        /** Lateral air-termination is needed here. */
        LATERAL_AIR_TERMINATION
    }

    /**
     * A facade band, or the part of one, that one answer of the rule applies to.
     *
     * @param band           the band as the engine computed it
     * @param bottom         lowest height of this part above ground, m
     * @param top            highest height of this part above ground, m
     * @param buildingHeight H of the building the band belongs to, m
     * @param need           what the rule asks for this part
     */
    public record Part(FacadeBand band, double bottom, double top, double buildingHeight, Need need) {

        public boolean needsLateralAirTermination() {
            return need == Need.LATERAL_AIR_TERMINATION;
        }
    }

    /**
     * The height from which a building of height H needs lateral air-termination:
     * {@code min(0.8·H, 120)} for H ≥ 60 m, positive infinity below 60 m.
     */
    public static double lateralFrom(double buildingHeight) {
        if (buildingHeight < TALL) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.min((1 - UPPER_SHARE) * buildingHeight, ALWAYS_ABOVE);
    }

    /** The parts of one band on a building of height H, bottom to top. */
    public static List<Part> split(FacadeBand band, double buildingHeight) {
        double from = lateralFrom(buildingHeight);
        if (band.top() <= from) {
            return List.of(new Part(band, band.bottom(), band.top(), buildingHeight, Need.NEGLIGIBLE));
        }
        if (band.bottom() >= from) {
            return List.of(new Part(band, band.bottom(), band.top(), buildingHeight, Need.LATERAL_AIR_TERMINATION));
        }
        return List.of(new Part(band, band.bottom(), from, buildingHeight, Need.NEGLIGIBLE),
                new Part(band, from, band.top(), buildingHeight, Need.LATERAL_AIR_TERMINATION));
    }

    /** The parts of every band of the site, in the bands' order, each band's bottom to top. */
    public static List<Part> classify(Site site, List<FacadeBand> bands) {
        if (bands.isEmpty()) {
            return List.of();
        }
        double[] heights = buildingHeights(site.structures());
        Map<String, List<Integer>> structuresById = new HashMap<>();
        for (int i = 0; i < site.structures().size(); i++) {
            structuresById.computeIfAbsent(site.structures().get(i).id(), k -> new ArrayList<>()).add(i);
        }
        Map<String, List<RooftopObject>> objectsById = new HashMap<>();
        for (RooftopObject o : site.rooftopObjects()) {
            objectsById.computeIfAbsent(o.id(), k -> new ArrayList<>()).add(o);
        }
        List<Part> out = new ArrayList<>();
        for (FacadeBand band : bands) {
            double h = ownerHeight(site, band, heights, structuresById, objectsById);
            // a band of an owner the site does not know is taken as needing, whole
            out.addAll(Double.isNaN(h) ? List.of(new Part(band, band.bottom(), band.top(), h,
                    Need.LATERAL_AIR_TERMINATION)) : split(band, h));
        }
        return List.copyOf(out);
    }

    /**
     * H of the band's owner, NaN when the site has no such owner. Where a structure and a rooftop
     * object share the owner's id, the one whose outline the band runs along owns it.
     */
    private static double ownerHeight(Site site, FacadeBand band, double[] heights,
            Map<String, List<Integer>> structuresById, Map<String, List<RooftopObject>> objectsById) {
        Point middle = band.line().getCentroid();
        double best = Double.POSITIVE_INFINITY;
        double height = Double.NaN;
        for (int i : structuresById.getOrDefault(band.ownerId(), List.of())) {
            double d = site.structures().get(i).footprint().getBoundary().distance(middle);
            if (d < best) {
                best = d;
                height = heights[i];
            }
        }
        for (RooftopObject o : objectsById.getOrDefault(band.ownerId(), List.of())) {
            double d = o.footprint().getBoundary().distance(middle);
            if (d < best) {
                best = d;
                height = standsOn(site, o, heights);
            }
        }
        return height;
    }

    /** H of the building a rooftop object stands on, or the object's own top on open ground. */
    private static double standsOn(Site site, RooftopObject o, double[] heights) {
        Point inside = o.footprint().getInteriorPoint();
        double h = Double.NaN;
        for (int i = 0; i < site.structures().size(); i++) {
            if (site.structures().get(i).footprint().covers(inside)) {
                h = Double.isNaN(h) ? heights[i] : Math.max(h, heights[i]);
            }
        }
        return Double.isNaN(h) ? o.top() : h;
    }

    /** H for each structure: the highest top among the structures it touches or overlaps, transitively. */
    private static double[] buildingHeights(List<Structure> structures) {
        int n = structures.size();
        int[] parent = new int[n];
        for (int i = 0; i < n; i++) {
            parent[i] = i;
        }
        for (int i = 0; i < n; i++) {
            Geometry a = structures.get(i).footprint();
            for (int j = i + 1; j < n; j++) {
                Geometry b = structures.get(j).footprint();
                if (a.getEnvelopeInternal().distance(b.getEnvelopeInternal()) <= TOUCH && a.isWithinDistance(b, TOUCH)) {
                    parent[root(parent, i)] = root(parent, j);
                }
            }
        }
        double[] top = new double[n];
        java.util.Arrays.fill(top, Double.NEGATIVE_INFINITY);
        for (int i = 0; i < n; i++) {
            int r = root(parent, i);
            top[r] = Math.max(top[r], structures.get(i).topHeight());
        }
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = top[root(parent, i)];
        }
        return out;
    }

    private static int root(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }
}

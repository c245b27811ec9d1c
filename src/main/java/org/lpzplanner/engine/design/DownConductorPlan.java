package org.lpzplanner.engine.design;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.algorithm.Orientation;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.CornerExposure;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.engine.model.Structure;

/**
 * Number and positions of down-conductors round a building [IEC 62305-3:2010 5.3]: at least two,
 * spread round the perimeter, at exposed corners first, no further apart than the typical spacing of
 * the level (Table 4: 10, 10, 15, 20 m for I to IV).
 *
 * <p><b>Outline.</b> Down-conductors stand on the outline of the {@link Building} as a whole: the
 * union of the footprints of the structures that overlap or touch. A wall between two parts of one
 * building lies inside it and gets none, and a corner two parts share is counted once.
 *
 * <p><b>Count.</b> Per outer ring of the outline (each separate part is its own outline):
 * n = max(2, ⌈perimeter / typical spacing⌉). A courtyard (a hole of the outline) whose perimeter is
 * more than {@value #COURTYARD_PERIMETER} m gets down-conductors of its own round it the same way
 * [IEC 62305-3:2010 Annex E, from memory: inner courtyards over 30 m in perimeter get down-conductors
 * at the typical spacing]; a smaller one gets none.
 *
 * <p><b>Positions.</b> Outside (convex) corners first — for a courtyard, the corners of the yard.
 * When there are more corners than n, the corners nearest the given exposed points are taken;
 * without exposed points the corners are spread: the first corner in ring order, then repeatedly the
 * corner farthest along the ring from those already taken (ties in ring order). The remaining
 * positions go into the gaps between chosen positions, each time into the gap whose share would be
 * longest, and are spaced evenly within each gap. Distances are measured along the ring. Because
 * corners stay fixed, an irregular outline can leave one gap longer than the typical spacing
 * although the count suffices on average; the layout reports it
 * ({@link DownConductorLayout#exceedsTypicalSpacing()}) and the designer decides whether to add one.
 *
 * <p><b>Limits.</b> Access, windows and the actual conductor routes are for the designer; a part
 * rising above another (a tower on a podium) gets no down-conductor on walls standing inside the
 * building's outline: its conductors run down to the lower roof and on to the outline. Stateless
 * and thread-safe.
 */
public final class DownConductorPlan {

    /** A courtyard with a longer perimeter than this, metres, gets down-conductors of its own. */
    public static final double COURTYARD_PERIMETER = 30;

    /** How far from the outline an edited position may stand, metres. */
    public static final double EDIT_REACH = 2.0;

    private static final double EPS = 1e-9;

    private DownConductorPlan() {
    }

    /** Layout for one structure on its own at the level's typical spacing, corners taken in spread order. */
    public static DownConductorLayout plan(Structure structure, ProtectionLevel level) {
        return plan(Building.of(structure), level.downConductorSpacing(), List.of());
    }

    /** Layout for one structure on its own; see {@link #plan(Building, double, List)}. */
    public static DownConductorLayout plan(Structure structure, double typicalSpacing, List<Coordinate> exposedPoints) {
        return plan(Building.of(structure), typicalSpacing, exposedPoints);
    }

    /**
     * Layout for the building at the given typical spacing, preferring the corners nearest
     * {@code exposedPoints} (may be empty).
     */
    public static DownConductorLayout plan(Building building, double typicalSpacing, List<Coordinate> exposedPoints) {
        if (!(typicalSpacing > 0)) {
            throw new IllegalArgumentException("typical down-conductor spacing must be positive, got " + typicalSpacing);
        }
        List<Coordinate> positions = new ArrayList<>();
        double perimeter = 0;
        double largest = 0;
        int required = 0;
        for (Ring ring : rings(building)) {
            int n = Math.max(2, (int) Math.ceil(ring.length / typicalSpacing - EPS));
            required += n;
            List<Double> stations = ring.stations(n, exposedPoints);
            for (double s : stations) {
                Coordinate c = ring.pointAt(s);
                // parts touching at a corner only: the shared corner is one position
                if (positions.stream().noneMatch(p -> p.distance(c) < 1e-3)) {
                    positions.add(c);
                }
            }
            for (int i = 0; i < stations.size(); i++) {
                double next = i + 1 < stations.size() ? stations.get(i + 1) : stations.get(0) + ring.length;
                largest = Math.max(largest, next - stations.get(i));
            }
            perimeter += ring.length;
        }
        return new DownConductorLayout(building, perimeter, typicalSpacing, required, positions, largest);
    }

    /**
     * Layouts of every building of a site at the level's typical spacing, preferring the outside
     * corners the sphere reaches on the bare structures (air-termination left out, 1 m grid): where
     * down-conductors go does not move when parts are added. The design page and the printed report
     * both plan this way, so they show the same positions.
     */
    public static List<DownConductorLayout> planSite(Site site, SphereSpec sphere) {
        List<Coordinate> exposedCorners = new ArrayList<>();
        for (CornerExposure c : ExposureAnalysis.analyze(site.withAirTermination(List.of(), List.of()),
                AnalysisOptions.of(sphere).withResolution(1.0)).corners()) {
            exposedCorners.add(c.point());
        }
        List<DownConductorLayout> out = new ArrayList<>();
        for (Building b : Building.of(site)) {
            out.add(plan(b, sphere.level().downConductorSpacing(), exposedCorners));
        }
        return out;
    }

    /** {@link #edited(Building, double, List)} for one structure on its own. */
    public static DownConductorLayout edited(Structure structure, double typicalSpacing, List<Coordinate> positions) {
        return edited(Building.of(structure), typicalSpacing, positions);
    }

    /**
     * The layout of positions a designer chose: perimeter and required count as {@link #plan},
     * largest spacing measured along the outline between neighbouring positions (each position
     * counts on the ring nearest to it; a ring with none counts its whole length as one gap).
     */
    public static DownConductorLayout edited(Building building, double typicalSpacing, List<Coordinate> positions) {
        List<Ring> rings = rings(building);
        List<List<Double>> stations = new ArrayList<>();
        double perimeter = 0;
        int required = 0;
        for (Ring ring : rings) {
            stations.add(new ArrayList<>());
            perimeter += ring.length;
            required += Math.max(2, (int) Math.ceil(ring.length / typicalSpacing - EPS));
        }
        for (Coordinate p : positions) {
            int best = 0;
            double bestDistance = Double.POSITIVE_INFINITY;
            for (int k = 0; k < rings.size(); k++) {
                double d = rings.get(k).distanceTo(p);
                if (d < bestDistance) {
                    bestDistance = d;
                    best = k;
                }
            }
            stations.get(best).add(rings.get(best).stationOf(p));
        }
        double largest = 0;
        for (int k = 0; k < rings.size(); k++) {
            List<Double> at = stations.get(k);
            at.sort(Double::compare);
            if (at.size() < 2) {
                largest = Math.max(largest, rings.get(k).length);
                continue;
            }
            for (int i = 0; i < at.size(); i++) {
                double next = i + 1 < at.size() ? at.get(i + 1) : at.get(0) + rings.get(k).length;
                largest = Math.max(largest, next - at.get(i));
            }
        }
        return new DownConductorLayout(building, perimeter, typicalSpacing, required, positions, largest);
    }

    /** The rings that carry down-conductors: every outer ring of the outline, then its courtyards over 30 m. */
    private static List<Ring> rings(Building building) {
        Geometry outline = building.outline();
        List<Ring> outer = new ArrayList<>();
        List<Ring> yards = new ArrayList<>();
        for (int k = 0; k < outline.getNumGeometries(); k++) {
            Polygon part = (Polygon) outline.getGeometryN(k);
            outer.add(new Ring(part.getExteriorRing().getCoordinates()));
            for (int h = 0; h < part.getNumInteriorRing(); h++) {
                Ring yard = new Ring(part.getInteriorRingN(h).getCoordinates());
                if (yard.length > COURTYARD_PERIMETER + EPS) {
                    yards.add(yard);
                }
            }
        }
        outer.addAll(yards);
        return outer;
    }

    /**
     * A closed ring, counter-clockwise, with the distance along it of each vertex. A courtyard's ring
     * is taken as the yard's own outline, so its convex corners are the corners of the yard.
     */
    private static final class Ring {
        final Coordinate[] cs;
        final double[] at;
        final double length;

        Ring(Coordinate[] closed) {
            Coordinate[] c = closed.clone();
            if (!Orientation.isCCW(c)) {
                for (int i = 0, j = c.length - 1; i < j; i++, j--) {
                    Coordinate t = c[i];
                    c[i] = c[j];
                    c[j] = t;
                }
            }
            cs = c;
            at = new double[c.length];
            for (int i = 1; i < c.length; i++) {
                at[i] = at[i - 1] + c[i - 1].distance(c[i]);
            }
            length = at[c.length - 1];
        }

        /** Plan distance from p to the ring. */
        double distanceTo(Coordinate p) {
            double best = Double.POSITIVE_INFINITY;
            for (int i = 1; i < cs.length; i++) {
                best = Math.min(best, org.locationtech.jts.algorithm.Distance.pointToSegment(p, cs[i - 1], cs[i]));
            }
            return best;
        }

        /** Distance along the ring of the ring point nearest p. */
        double stationOf(Coordinate p) {
            double best = Double.POSITIVE_INFINITY;
            double station = 0;
            for (int i = 1; i < cs.length; i++) {
                org.locationtech.jts.geom.LineSegment seg = new org.locationtech.jts.geom.LineSegment(cs[i - 1], cs[i]);
                double f = seg.segmentFraction(p);
                Coordinate q = seg.pointAlong(f);
                double d = q.distance(p);
                if (d < best) {
                    best = d;
                    station = at[i - 1] + f * seg.getLength();
                }
            }
            return station;
        }

        /** Distances along the ring of the n positions, sorted. */
        List<Double> stations(int n, List<Coordinate> exposed) {
            List<Integer> corners = outsideCorners();
            List<Double> chosen = new ArrayList<>();
            if (!exposed.isEmpty()) {
                corners.sort(Comparator.comparingDouble(i -> nearest(cs[i], exposed)));
                for (int i = 0; i < Math.min(n, corners.size()); i++) {
                    chosen.add(at[corners.get(i)]);
                }
            } else {
                List<Integer> left = new ArrayList<>(corners);
                while (chosen.size() < n && !left.isEmpty()) {
                    int bestIndex = 0;
                    double bestGap = -1;
                    for (int j = 0; j < left.size(); j++) {
                        double gap = chosen.isEmpty() ? 0 : gapTo(at[left.get(j)], chosen);
                        if (gap > bestGap + EPS) {
                            bestGap = gap;
                            bestIndex = j;
                        }
                    }
                    chosen.add(at[left.remove(bestIndex)]);
                }
            }
            if (chosen.isEmpty()) {
                chosen.add(0.0);
            }
            chosen.sort(Double::compare);
            return fillGaps(chosen, n);
        }

        /** Adds n − chosen.size() stations, each into the gap whose even share is longest. */
        private List<Double> fillGaps(List<Double> chosen, int n) {
            int m = chosen.size();
            double[] gap = new double[m];
            int[] extra = new int[m];
            for (int i = 0; i < m; i++) {
                gap[i] = (i + 1 < m ? chosen.get(i + 1) : chosen.get(0) + length) - chosen.get(i);
            }
            for (int added = m; added < n; added++) {
                int best = 0;
                for (int i = 1; i < m; i++) {
                    if (gap[i] / (extra[i] + 1) > gap[best] / (extra[best] + 1) + EPS) {
                        best = i;
                    }
                }
                extra[best]++;
            }
            List<Double> out = new ArrayList<>();
            for (int i = 0; i < m; i++) {
                for (int e = 0; e <= extra[i]; e++) {
                    out.add((chosen.get(i) + gap[i] * e / (extra[i] + 1)) % length);
                }
            }
            out.sort(Double::compare);
            return out;
        }

        /** Shortest distance along the ring from s to any chosen station. */
        private double gapTo(double s, List<Double> chosen) {
            double best = Double.POSITIVE_INFINITY;
            for (double c : chosen) {
                double d = Math.abs(s - c);
                best = Math.min(best, Math.min(d, length - d));
            }
            return best;
        }

        /** Indices of the vertices where the outline turns left (outside corners of a CCW ring), in ring order. */
        private List<Integer> outsideCorners() {
            List<Integer> out = new ArrayList<>();
            int n = cs.length - 1;
            for (int i = 0; i < n; i++) {
                Coordinate prev = cs[(i + n - 1) % n], here = cs[i], next = cs[i + 1];
                double cross = (here.x - prev.x) * (next.y - here.y) - (here.y - prev.y) * (next.x - here.x);
                double scale = prev.distance(here) * here.distance(next);
                if (scale > 0 && cross > 1e-6 * scale) {
                    out.add(i);
                }
            }
            return out;
        }

        private static double nearest(Coordinate c, List<Coordinate> points) {
            double best = Double.POSITIVE_INFINITY;
            for (Coordinate p : points) {
                best = Math.min(best, c.distance(p));
            }
            return best;
        }

        Coordinate pointAt(double s) {
            for (int i = 1; i < cs.length; i++) {
                if (s <= at[i] + EPS) {
                    double seg = at[i] - at[i - 1];
                    double t = seg == 0 ? 0 : (s - at[i - 1]) / seg;
                    return new Coordinate(cs[i - 1].x + t * (cs[i].x - cs[i - 1].x), cs[i - 1].y + t * (cs[i].y - cs[i - 1].y));
                }
            }
            return new Coordinate(cs[0].x, cs[0].y);
        }
    }
}

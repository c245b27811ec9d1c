package org.lpzplanner.sections;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.geom.SiteSurface;

/**
 * A vertical section of a site along a straight cut in local metres: the structure profile, the
 * protection envelope E above it, the rods standing near the cut and a few resting positions of the
 * sphere. Distances {@code s} run from the cut's start (0) to its end ({@code length}).
 *
 * <p>The profile is sampled every {@value #PROFILE_STEP} m: {@link SiteSurface#topHeight}, raised to
 * a parapet's top within {@value #PARAPET_DRAWN} m of its line on a structure so that parapets show
 * (open ground stays at 0). E is
 * {@link EnvelopeField#heightAt} (never above the true value, at most {@value #TOLERANCE} m below)
 * every {@value #ENVELOPE_STEP} m, at every profile breakpoint and at every profile sample on a
 * structure. A profile sample on a structure counts as exposed (LPZ 0A) when E there is no more than
 * {@value #EXPOSED_SLACK} m above it; E being a lower bound, this errs toward "exposed".
 *
 * <p>Not thread-confined; the values are immutable once built.
 */
public record SiteSection(double x1, double y1, double x2, double y2, double length, double radius,
        List<Point> profile, List<Boolean> exposed, List<Point> envelope, List<RodMark> rods, List<Point> spheres) {

    /** Profile sampling step along the cut, metres. */
    public static final double PROFILE_STEP = 0.25;
    /** A parapet is drawn this far (metres) each side of its line, wider than a sampling step. */
    static final double PARAPET_DRAWN = 0.3;
    /** Envelope sampling step along the cut, metres. */
    public static final double ENVELOPE_STEP = 0.5;
    /** Rods within this plan distance of the cut are drawn, metres. */
    public static final double ROD_REACH = 0.5;
    static final double TOLERANCE = 0.001;
    static final double EXPOSED_SLACK = 0.01;
    private static final int MAX_SPHERES = 3;

    /** A point of the section: distance along the cut and height, metres. */
    public record Point(double s, double z) {
    }

    /** A rod near the cut: its name (or id), where it stands along the cut, its base and tip height. */
    public record RodMark(String name, double s, double base, double top) {
    }

    public SiteSection {
        profile = List.copyOf(profile);
        exposed = List.copyOf(exposed);
        envelope = List.copyOf(envelope);
        rods = List.copyOf(rods);
        spheres = List.copyOf(spheres);
    }

    /** The highest sampled envelope value, with where it lies. */
    public Point envelopeMax() {
        Point best = new Point(0, 0);
        for (Point p : envelope) {
            if (p.z() > best.z()) {
                best = p;
            }
        }
        return best;
    }

    /**
     * Samples the section along the cut from (x1, y1) to (x2, y2).
     *
     * @throws IllegalArgumentException when the cut has no length
     */
    public static SiteSection cut(SiteSurface surface, EnvelopeField field, double x1, double y1, double x2,
            double y2) {
        double length = Math.hypot(x2 - x1, y2 - y1);
        if (!(length > 0)) {
            throw new IllegalArgumentException("the cut has no length");
        }
        double ux = (x2 - x1) / length, uy = (y2 - y1) / length;
        int n = (int) Math.ceil(length / PROFILE_STEP - 1e-9);
        double[] s = new double[n + 1];
        double[] top = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            s[i] = Math.min(i * PROFILE_STEP, length);
            double x = x1 + ux * s[i], y = y1 + uy * s[i];
            top[i] = surface.topHeight(x, y) > 0 ? surface.drawnTop(x, y, PARAPET_DRAWN) : 0;
        }
        Map<Double, Double> e = new TreeMap<>();
        java.util.function.DoubleUnaryOperator envelopeAt = d -> e.computeIfAbsent(d,
                k -> field.heightAt(x1 + ux * k, y1 + uy * k, TOLERANCE));
        for (int i = 0; i * ENVELOPE_STEP < length; i++) {
            envelopeAt.applyAsDouble(i * ENVELOPE_STEP);
        }
        envelopeAt.applyAsDouble(length);
        List<Point> profile = new ArrayList<>();
        List<Boolean> exposed = new ArrayList<>();
        for (int i = 0; i <= n; i++) {
            boolean breakpoint = i > 0 && i < n && Math.abs(top[i + 1] - 2 * top[i] + top[i - 1]) > 1e-6;
            boolean onStructure = top[i] > 0;
            double ei = breakpoint || onStructure ? envelopeAt.applyAsDouble(s[i]) : Double.NaN;
            profile.add(new Point(s[i], top[i]));
            exposed.add(onStructure && top[i] >= ei - EXPOSED_SLACK);
        }
        List<Point> envelope = e.entrySet().stream().map(en -> new Point(en.getKey(), en.getValue())).toList();
        List<RodMark> rods = new ArrayList<>();
        for (SiteSurface.PlacedRod placed : surface.rods()) {
            double t = (placed.tip().x - x1) * ux + (placed.tip().y - y1) * uy;
            double along = Math.max(0, Math.min(length, t));
            double off = Math.hypot(placed.tip().x - (x1 + ux * along), placed.tip().y - (y1 + uy * along));
            if (off <= ROD_REACH) {
                String name = placed.rod().name() == null || placed.rod().name().isBlank() ? placed.rod().id()
                        : placed.rod().name();
                rods.add(new RodMark(name, along, placed.base(), placed.tip().getZ()));
            }
        }
        List<Point> spheres = restingSpheres(envelope, p -> surface.topHeight(x1 + ux * p, y1 + uy * p) <= 0,
                field.radius());
        return new SiteSection(x1, y1, x2, y2, length, field.radius(), profile, exposed, envelope, rods, spheres);
    }

    /**
     * Centres of the sphere drawn resting on the envelope, kept simple: a sphere sits where E has a
     * local minimum over open ground, its centre R above that point, (s, E(s) + R). A run of equal
     * minima (a flat stretch) between higher envelope gives its middle; a flat stretch running to an
     * end of the cut gives its inner end, where the sphere also leans on what stands beside it.
     * Valleys between structures come first, then those at the ends, lowest first; at most three.
     */
    static List<Point> restingSpheres(List<Point> envelope, java.util.function.DoublePredicate openGround,
            double radius) {
        List<Point> valleys = new ArrayList<>();
        List<Point> ends = new ArrayList<>();
        int m = envelope.size();
        int k = 0;
        while (k < m) {
            double level = envelope.get(k).z();
            int j = k;
            while (j + 1 < m && Math.abs(envelope.get(j + 1).z() - level) <= TOLERANCE) {
                j++;
            }
            boolean leftEnd = k == 0, rightEnd = j == m - 1;
            boolean leftHigher = leftEnd || envelope.get(k - 1).z() > level;
            boolean rightHigher = rightEnd || envelope.get(j + 1).z() > level;
            if (leftHigher && rightHigher && !(leftEnd && rightEnd)) {
                Point at = leftEnd ? envelope.get(j) : rightEnd ? envelope.get(k) : envelope.get((k + j) / 2);
                if (openGround.test(at.s())) {
                    (leftEnd || rightEnd ? ends : valleys).add(new Point(at.s(), at.z() + radius));
                }
            }
            k = j + 1;
        }
        valleys.sort(java.util.Comparator.comparingDouble(Point::z));
        ends.sort(java.util.Comparator.comparingDouble(Point::z));
        List<Point> chosen = new ArrayList<>(valleys);
        chosen.addAll(ends);
        return chosen.subList(0, Math.min(MAX_SPHERES, chosen.size()));
    }
}

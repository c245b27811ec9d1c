package org.lpzplanner.engine.envelope;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * A small random site for the envelope properties: 0–3 flat-roofed boxes (rotated or not, roof
 * heights 2–80 m) and 0–3 rods (1–15 m, on open ground or on a roof), at least one of either, and
 * a sphere radius drawn from the four protection levels or a custom value. Every draw comes from
 * one seeded {@link Random}, so a seed reproduces the scene and its query points.
 */
final class RandomScene {

    private static final GeometryFactory GF = new GeometryFactory();

    /** A box footprint: centre, half sizes along its own axes, rotation (radians), roof height. */
    record Box(double cx, double cy, double halfW, double halfL, double angle, double height) {

        /** Corners counter-clockwise, the first repeated at the end. */
        double[][] corners() {
            double c = Math.cos(angle), s = Math.sin(angle);
            double[][] local = {{-halfW, -halfL}, {halfW, -halfL}, {halfW, halfL}, {-halfW, halfL}};
            double[][] out = new double[5][];
            for (int k = 0; k < 4; k++) {
                out[k] = new double[] {cx + c * local[k][0] - s * local[k][1], cy + s * local[k][0] + c * local[k][1]};
            }
            out[4] = out[0];
            return out;
        }

        /** A point given in the box's own frame, in site coordinates. */
        double[] toSite(double u, double v) {
            double c = Math.cos(angle), s = Math.sin(angle);
            return new double[] {cx + c * u - s * v, cy + s * u + c * v};
        }

        Box shifted(double dx, double dy) {
            return new Box(cx + dx, cy + dy, halfW, halfL, angle, height);
        }

        Polygon footprint() {
            double[][] k = corners();
            Coordinate[] cs = new Coordinate[5];
            for (int i = 0; i < 5; i++) {
                cs[i] = new Coordinate(k[i][0], k[i][1]);
            }
            return GF.createPolygon(cs);
        }
    }

    /** A query point with a label saying how it was drawn. */
    record Query(String kind, double x, double y) {
        @Override
        public String toString() {
            return String.format(Locale.ROOT, "%s (%.6f, %.6f)", kind, x, y);
        }
    }

    final long seed;
    final List<Box> boxes;
    final List<Rod> rods;
    final double radius;

    private RandomScene(long seed, List<Box> boxes, List<Rod> rods, double radius) {
        this.seed = seed;
        this.boxes = List.copyOf(boxes);
        this.rods = List.copyOf(rods);
        this.radius = radius;
    }

    /** Radius of one of the four levels, or (one time in five) a custom radius of 15–80 m. */
    static double radius(Random rnd) {
        int k = rnd.nextInt(5);
        return k < 4 ? ProtectionLevel.values()[k].sphereRadius() : 15 + 65 * rnd.nextDouble();
    }

    static RandomScene generate(long seed) {
        Random rnd = new Random(seed);
        double radius = radius(rnd);
        List<Box> boxes = new ArrayList<>();
        int nBoxes = rnd.nextInt(4);
        for (int i = 0; i < nBoxes; i++) {
            boxes.add(box(rnd));
        }
        List<Rod> rods = new ArrayList<>();
        int nRods = nBoxes == 0 ? 1 + rnd.nextInt(3) : rnd.nextInt(4);
        for (int i = 0; i < nRods; i++) {
            rods.add(rod(rnd, boxes, i));
        }
        return new RandomScene(seed, boxes, rods, radius);
    }

    /** A box with centre in [−12, 12]², half sizes 2–10 m, half of them rotated, roof 2–80 m. */
    static Box box(Random rnd) {
        double angle = rnd.nextBoolean() ? 0 : rnd.nextDouble() * Math.PI / 2;
        return new Box(-12 + 24 * rnd.nextDouble(), -12 + 24 * rnd.nextDouble(), 2 + 8 * rnd.nextDouble(),
                2 + 8 * rnd.nextDouble(), angle, 2 + 78 * rnd.nextDouble());
    }

    /** A rod of 1–15 m on open ground in [−20, 20]², or on a roof at least 0.3 m inside its edges. */
    static Rod rod(Random rnd, List<Box> boxes, int index) {
        double h = 1 + 14 * rnd.nextDouble();
        if (!boxes.isEmpty() && rnd.nextBoolean()) {
            Box b = boxes.get(rnd.nextInt(boxes.size()));
            double[] p = b.toSite((b.halfW - 0.3) * (2 * rnd.nextDouble() - 1), (b.halfL - 0.3) * (2 * rnd.nextDouble() - 1));
            return new Rod("rod" + index, "Rod " + index, p[0], p[1], h);
        }
        return new Rod("rod" + index, "Rod " + index, -20 + 40 * rnd.nextDouble(), -20 + 40 * rnd.nextDouble(), h);
    }

    Site site() {
        return site(boxes, rods);
    }

    static Site site(List<Box> boxes, List<Rod> rods) {
        List<Structure> structures = new ArrayList<>();
        for (int i = 0; i < boxes.size(); i++) {
            Box b = boxes.get(i);
            structures.add(new Structure("b" + i, "Box " + i, b.footprint(), b.height(), new RoofShape.Flat(0)));
        }
        return new Site("random", structures, List.of(), rods, List.of());
    }

    /** The same scene moved by (dx, dy). */
    RandomScene shifted(double dx, double dy) {
        List<Box> b = boxes.stream().map(x -> x.shifted(dx, dy)).toList();
        List<Rod> r = rods.stream().map(x -> new Rod(x.id(), x.name(), x.x() + dx, x.y() + dy, x.height())).toList();
        return new RandomScene(seed, b, r, radius);
    }

    RandomScene withRadius(double r) {
        return new RandomScene(seed, boxes, rods, r);
    }

    RandomScene withRods(List<Rod> r) {
        return new RandomScene(seed, boxes, r, radius);
    }

    /**
     * Query points of every kind the scene has. For each box: a roof point anywhere on the roof at
     * least 0.01 m inside its edges, one 0.01–0.1 m inside a roof edge, one 0.01–0.1 m inside both
     * edges at a roof corner, one 0.01–0.1 m and one 0.1–3 m outside a wall. For each rod: the
     * rod's own column (the tip), a point 0–0.5 m and one 0–12 m from it. Two points anywhere
     * within R of the scene. Points drawn against a box keep 0.01 m from its wall lines, where
     * {@link org.lpzplanner.engine.reference.ReferenceEnvelope}'s stated bound holds; points on
     * edges and corners are checked against closed forms ({@link ClosedFormEnvelopeTest},
     * {@link BareFlatRoofProperties}).
     */
    List<Query> queries(Random rnd) {
        List<Query> out = new ArrayList<>();
        for (Box b : boxes) {
            double[] p = b.toSite((b.halfW - 0.01) * (2 * rnd.nextDouble() - 1), (b.halfL - 0.01) * (2 * rnd.nextDouble() - 1));
            out.add(new Query("roof", p[0], p[1]));
            out.add(insideEdge(rnd, b, 0.01, 0.1));
            out.add(insideCorner(rnd, b, 0.01, 0.1));
            out.add(outsideWall(rnd, b, 0.01, 0.1));
            out.add(outsideWall(rnd, b, 0.1, 3));
        }
        for (Rod r : rods) {
            out.addAll(aroundRod(rnd, r));
        }
        for (int k = 0; k < 2; k++) {
            out.add(pointAround(rnd, "open", extent(), radius));
        }
        return out;
    }

    /** The rod's own column, a point 0–0.5 m from it and one 0–12 m from it. */
    static List<Query> aroundRod(Random rnd, Rod r) {
        double a = 2 * Math.PI * rnd.nextDouble(), d = 0.5 * rnd.nextDouble();
        double b = 2 * Math.PI * rnd.nextDouble(), e = 12 * rnd.nextDouble();
        return List.of(new Query("at rod", r.x(), r.y()),
                new Query(String.format(Locale.ROOT, "%.3f m from rod", d), r.x() + d * Math.cos(a), r.y() + d * Math.sin(a)),
                new Query(String.format(Locale.ROOT, "%.3f m from rod", e), r.x() + e * Math.cos(b), r.y() + e * Math.sin(b)));
    }

    /** A point in the rectangle [minX − margin, maxX + margin] × [minY − margin, maxY + margin]. */
    static Query pointAround(Random rnd, String kind, double[] ext, double margin) {
        double x = ext[0] - margin + (ext[2] - ext[0] + 2 * margin) * rnd.nextDouble();
        double y = ext[1] - margin + (ext[3] - ext[1] + 2 * margin) * rnd.nextDouble();
        return new Query(kind, x, y);
    }

    /** A roof point {@code min}–{@code max} m inside one edge of the box, anywhere along it. */
    static Query insideEdge(Random rnd, Box b, double min, double max) {
        double in = min + (max - min) * rnd.nextDouble();
        double along = 2 * rnd.nextDouble() - 1;
        double[] p = switch (rnd.nextInt(4)) {
            case 0 -> b.toSite(b.halfW - in, (b.halfL - min) * along);
            case 1 -> b.toSite(-b.halfW + in, (b.halfL - min) * along);
            case 2 -> b.toSite((b.halfW - min) * along, b.halfL - in);
            default -> b.toSite((b.halfW - min) * along, -b.halfL + in);
        };
        return new Query(String.format(Locale.ROOT, "%.3f m inside roof edge", in), p[0], p[1]);
    }

    /** A roof point {@code min}–{@code max} m inside both edges at one corner of the box. */
    static Query insideCorner(Random rnd, Box b, double min, double max) {
        double su = rnd.nextBoolean() ? 1 : -1, sv = rnd.nextBoolean() ? 1 : -1;
        double inU = min + (max - min) * rnd.nextDouble(), inV = min + (max - min) * rnd.nextDouble();
        double[] p = b.toSite(su * (b.halfW - inU), sv * (b.halfL - inV));
        return new Query(String.format(Locale.ROOT, "%.3f m x %.3f m inside roof corner", inU, inV), p[0], p[1]);
    }

    /** A point {@code min}–{@code max} m outside one wall of the box, anywhere along it. */
    static Query outsideWall(Random rnd, Box b, double min, double max) {
        double out = min + (max - min) * rnd.nextDouble();
        double along = 2 * rnd.nextDouble() - 1;
        double[] p = switch (rnd.nextInt(4)) {
            case 0 -> b.toSite(b.halfW + out, b.halfL * along);
            case 1 -> b.toSite(-b.halfW - out, b.halfL * along);
            case 2 -> b.toSite(b.halfW * along, b.halfL + out);
            default -> b.toSite(b.halfW * along, -b.halfL - out);
        };
        return new Query(String.format(Locale.ROOT, "%.3f m outside wall", out), p[0], p[1]);
    }

    /** Plan bounding box of boxes and rods: [minX, minY, maxX, maxY]. */
    double[] extent() {
        double x0 = Double.POSITIVE_INFINITY, y0 = Double.POSITIVE_INFINITY;
        double x1 = Double.NEGATIVE_INFINITY, y1 = Double.NEGATIVE_INFINITY;
        for (Box b : boxes) {
            for (double[] c : b.corners()) {
                x0 = Math.min(x0, c[0]);
                y0 = Math.min(y0, c[1]);
                x1 = Math.max(x1, c[0]);
                y1 = Math.max(y1, c[1]);
            }
        }
        for (Rod r : rods) {
            x0 = Math.min(x0, r.x());
            y0 = Math.min(y0, r.y());
            x1 = Math.max(x1, r.x());
            y1 = Math.max(y1, r.y());
        }
        return new double[] {x0, y0, x1, y1};
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "seed %d, R = %.4f m", seed, radius));
        for (Box b : boxes) {
            sb.append(String.format(Locale.ROOT, "%n  box centre (%.6f, %.6f) half sizes %.6f x %.6f angle %.6f rad roof %.6f m",
                    b.cx(), b.cy(), b.halfW(), b.halfL(), b.angle(), b.height()));
        }
        for (Rod r : rods) {
            sb.append(String.format(Locale.ROOT, "%n  rod at (%.6f, %.6f) height %.6f m", r.x(), r.y(), r.height()));
        }
        return sb.toString();
    }
}

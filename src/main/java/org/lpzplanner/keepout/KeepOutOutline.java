package org.lpzplanner.keepout;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.valid.IsSimpleOp;
import org.lpzplanner.system.InvalidInputException;
import tools.jackson.databind.JsonNode;

/**
 * The outline of a keep-out area: read from JSON and checked (3 to {@value #MAX_CORNERS} corners,
 * finite numbers within {@value #MAX_COORDINATE} m of the site's origin, no corner repeating the one
 * before it, an area of at least {@value #MIN_AREA} m², an outline that does not cross itself).
 * Every refusal names the field ({@code corners} or {@code corners[i]}).
 */
public final class KeepOutOutline {

    public static final int MAX_CORNERS = 200;
    /** Local coordinates are metres from the site's origin; a site is never this large. */
    public static final double MAX_COORDINATE = 100_000;
    /** Smallest area worth keeping out, m² (10 cm × 10 cm). */
    public static final double MIN_AREA = 0.01;

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private KeepOutOutline() {
    }

    /** Reads {@code [[x, y], …]}; a last corner equal to the first (a closed ring) is dropped. */
    public static List<double[]> read(JsonNode node, String field) {
        if (node == null || node.isMissingNode() || node.isNull()) {
            throw new InvalidInputException(field, "send \"" + field + "\": the outline as [[x, y], …] in local"
                    + " metres, at least 3 corners");
        }
        if (!node.isArray()) {
            throw new InvalidInputException(field, field + " must be an array of corners [x, y] in local metres");
        }
        List<double[]> corners = new ArrayList<>();
        for (int i = 0; i < node.size(); i++) {
            JsonNode p = node.get(i);
            if (!p.isArray() || p.size() != 2 || !p.get(0).isNumber() || !p.get(1).isNumber()) {
                throw new InvalidInputException(field + "[" + i + "]", "corner " + (i + 1)
                        + " must be [x, y], two numbers of metres, got " + p);
            }
            corners.add(new double[] {p.get(0).doubleValue(), p.get(1).doubleValue()});
        }
        return checked(corners, field);
    }

    /**
     * Checks an outline and returns it without a closing corner.
     *
     * @throws InvalidInputException naming {@code field} or {@code field[i]}
     */
    public static List<double[]> checked(List<double[]> given, String field) {
        if (given == null) {
            throw new InvalidInputException(field, "give the outline as [[x, y], …] in local metres");
        }
        List<double[]> corners = new ArrayList<>(given);
        if (corners.size() > 3 && same(corners.get(0), corners.get(corners.size() - 1))) {
            corners.remove(corners.size() - 1);
        }
        if (corners.size() < 3 || corners.size() > MAX_CORNERS) {
            throw new InvalidInputException(field, "a keep-out area needs 3 to " + MAX_CORNERS + " corners, got "
                    + corners.size());
        }
        for (int i = 0; i < corners.size(); i++) {
            double[] c = corners.get(i);
            if (c == null || c.length != 2 || !Double.isFinite(c[0]) || !Double.isFinite(c[1])) {
                throw new InvalidInputException(field + "[" + i + "]", "corner " + (i + 1)
                        + " must be two finite numbers of metres");
            }
            if (Math.abs(c[0]) > MAX_COORDINATE || Math.abs(c[1]) > MAX_COORDINATE) {
                throw new InvalidInputException(field + "[" + i + "]", "corner " + (i + 1) + " lies more than "
                        + (int) MAX_COORDINATE + " m from the site's origin; give local metres, not degrees of a map");
            }
            if (i > 0 && same(c, corners.get(i - 1))) {
                throw new InvalidInputException(field + "[" + i + "]", "corner " + (i + 1)
                        + " repeats the corner before it");
            }
        }
        LinearRing ring = ring(corners);
        // corners (nearly) on one line first: such a ring also folds back on itself, but this says why
        double hull = ring.convexHull().getArea();
        if (!(hull >= MIN_AREA)) {
            throw new InvalidInputException(field, String.format(Locale.ROOT, "the corners (nearly) lie on a line"
                    + " (%.4f m² inside them); a keep-out area needs at least %.2f m²", hull, MIN_AREA));
        }
        IsSimpleOp simple = new IsSimpleOp(ring);
        if (!simple.isSimple()) {
            Coordinate at = simple.getNonSimpleLocation();
            throw new InvalidInputException(field, String.format(Locale.ROOT, "the outline crosses itself near"
                    + " (%.2f, %.2f); give the corners in order round the area", at.x, at.y));
        }
        double area = GEOMETRY.createPolygon(ring).getArea();
        if (!(area >= MIN_AREA)) {
            throw new InvalidInputException(field, String.format(Locale.ROOT, "the area is %.4f m²; a keep-out"
                    + " area needs at least %.2f m²", area, MIN_AREA));
        }
        return corners;
    }

    /** The outline as a polygon in local metres. */
    public static Polygon polygon(List<double[]> corners) {
        return GEOMETRY.createPolygon(ring(corners));
    }

    /** Plan area in m² (shoelace formula, through JTS). */
    public static double area(List<double[]> corners) {
        return polygon(corners).getArea();
    }

    private static LinearRing ring(List<double[]> corners) {
        Coordinate[] cs = new Coordinate[corners.size() + 1];
        for (int i = 0; i < corners.size(); i++) {
            cs[i] = new Coordinate(corners.get(i)[0], corners.get(i)[1]);
        }
        cs[corners.size()] = cs[0].copy();
        return GEOMETRY.createLinearRing(cs);
    }

    private static boolean same(double[] a, double[] b) {
        return a != null && b != null && a.length == 2 && b.length == 2 && Math.hypot(a[0] - b[0], a[1] - b[1]) < 1e-3;
    }
}

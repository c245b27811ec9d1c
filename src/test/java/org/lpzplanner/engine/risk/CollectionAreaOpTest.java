package org.lpzplanner.engine.risk;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * Collection areas against the rectangle formula of IEC 62305-2:2010 Annex A and against hand
 * calculations. Every JTS result must lie in [exact · (1 − MAX_RELATIVE_ERROR), exact], the bound of
 * {@link CollectionAreaOp} (inscribed buffers never exceed the exact zone); 1e-9 relative covers
 * floating-point rounding.
 */
class CollectionAreaOpTest {

    private static final double ROUNDING = 1e-9;
    private static final int N = CollectionAreaOp.QUADRANT_SEGMENTS;
    private static final double Q = Math.PI / (2 * N);

    private static Geometry wkt(String text) {
        try {
            return new WKTReader(new GeometryFactory()).read(text);
        } catch (ParseException e) {
            throw new IllegalArgumentException(e);
        }
    }

    private static Structure flat(String id, double x0, double y0, double x1, double y1, double height) {
        return new Structure(id, id, box(x0, y0, x1, y1), height, new RoofShape.Flat(0));
    }

    private static Polygon box(double x0, double y0, double x1, double y1) {
        return (Polygon) wkt("POLYGON((" + x0 + " " + y0 + ", " + x1 + " " + y0 + ", " + x1 + " " + y1 + ", " + x0 + " " + y1
                + ", " + x0 + " " + y0 + "))");
    }

    private static void assertWithinBufferError(double computed, double exact) {
        assertThat(computed).isLessThanOrEqualTo(exact * (1 + ROUNDING));
        assertThat(computed).isGreaterThanOrEqualTo(exact * (1 - CollectionAreaOp.MAX_RELATIVE_ERROR - ROUNDING));
    }

    private static void assertWithinStatedBound(CollectionArea a, double exact) {
        assertThat(a.area()).isLessThanOrEqualTo(exact * (1 + ROUNDING));
        assertThat(a.area()).isGreaterThanOrEqualTo(exact * (1 - a.maxRelativeError() - ROUNDING));
    }

    /** Area of n chords replacing a quarter circle of radius r: n triangles of (r²/2)·sin q. */
    private static double inscribedQuarter(double r) {
        return N * r * r / 2 * Math.sin(Q);
    }

    @Test
    void rectangleFormulaMatchesHandArithmetic() {
        // 10 × 20 × 5 m: 3H = 15; 200 + 2·15·30 + π·225 = 1100 + 225π = 1806.858347 (hand)
        assertThat(CollectionAreaOp.rectangleFormula(10, 20, 5)).isCloseTo(1100 + 225 * Math.PI, within(1e-9));
        assertThat(CollectionAreaOp.rectangleFormula(10, 20, 5)).isCloseTo(1806.858347, within(1e-6));
    }

    @Test
    void statedErrorBoundIsBelowOneThousandth() {
        // 1 − sin α/α with α = 1.5·π/96 = 0.049087: 4.015e-4 (hand, series α²/6 − α⁴/120)
        assertThat(CollectionAreaOp.MAX_RELATIVE_ERROR).isCloseTo(4.0155e-4, within(1e-7)).isLessThan(1e-3);
    }

    @ParameterizedTest(name = "{0} x {1} x {2} m")
    @CsvSource({"10, 20, 5", "40, 40, 10", "100, 8, 3", "1, 1, 30", "60, 12.5, 0.4"})
    void rectangleOfJtsBuffersAgreesWithFormulaWithinBufferError(double l, double w, double h) {
        CollectionArea a = CollectionAreaOp.ofStructures(List.of(flat("r", 0, 0, l, w, h)));

        double exact = CollectionAreaOp.rectangleFormula(l, w, h);
        assertWithinBufferError(a.area(), exact);
        // right-angled corners: each rounded corner is exactly N chords of angle q
        double r = 3 * h;
        assertThat(a.area()).isCloseTo(l * w + 2 * r * (l + w) + 4 * inscribedQuarter(r), within(exact * ROUNDING));
    }

    @ParameterizedTest(name = "upper bound, {0} x {1} x {2} m")
    @CsvSource({"10, 20, 5", "40, 40, 10", "100, 8, 3", "1, 1, 30"})
    void upperBoundIsNeverBelowTheRectangleFormula(double l, double w, double h) {
        // exact A_D of an isolated rectangle [IEC 62305-2:2010 Annex A]; the risk estimate uses the upper bound
        CollectionArea a = CollectionAreaOp.ofStructures(List.of(flat("r", 0, 0, l, w, h)));
        double exact = CollectionAreaOp.rectangleFormula(l, w, h);
        assertThat(a.upperBound()).isGreaterThanOrEqualTo(exact * (1 - ROUNDING));
        assertThat(a.upperBound()).isLessThanOrEqualTo(exact * (1 + 2 * a.maxRelativeError()));
    }

    @Test
    void parapetCountsInTheHeight() {
        // wall top 8 m + parapet 1 m = 9 m: same as the 9 m rectangle formula
        Structure s = new Structure("p", "p", box(0, 0, 30, 10), 8, new RoofShape.Flat(1));
        assertWithinBufferError(CollectionAreaOp.ofStructures(List.of(s)).area(), CollectionAreaOp.rectangleFormula(30, 10, 9));
    }

    @Test
    void gableRoofTakesEachPointAtItsOwnHeight() {
        // 20 × 10 m footprint, walls 4 m, ridge 7 m along x at y = 5 (bearing 90°).
        // Eaves at y = 0 and y = 10 have r = 3·4 = 12, the ridge r = 3·7 = 21. The eave disc at
        // (x, 0) lies inside the ridge disc at (x, 5) since 5 + 12 ≤ 21, and every roof point's disc
        // lies in the hull of its face's corner discs, so the zone is the ridge's stadium:
        // A_D = 20·(2·21) + π·21² = 840 + 441π = 2225.442 m² (hand).
        // The whole footprint at 7 m would give 1460 + 441π (rectangle formula), 620 m² more.
        Structure s = new Structure("g", "g", box(0, 0, 20, 10), 4, new RoofShape.Gable(7, 90));
        CollectionArea a = CollectionAreaOp.ofStructures(List.of(s));

        assertWithinStatedBound(a, 840 + 441 * Math.PI);
        assertThat(a.area()).isLessThan(CollectionAreaOp.rectangleFormula(20, 10, 7) - 600);
        assertThat(a.area()).isGreaterThan(CollectionAreaOp.rectangleFormula(20, 10, 4));
    }

    @Test
    void shedRoofIsTheHullOfItsCornerDiscs() {
        // 20 × 10 m footprint, low side y = 0 at 3 m (r = 9), high side y = 10 at 6 m (r = 18),
        // bearing 0° (high side north). 10 + 9 > 18, so the low side sticks out of the high side's
        // zone. The zone is A ⊕ [0, 20]·x̂ with A the hull of the discs (0, 0, r 9) and (0, 10, r 18),
        // so its area is area(A) + 20 · (y-extent of A) (Minkowski sum of a convex set and a segment).
        // Hull of two discs, centre distance d, radii R > r: tangent length L = √(d² − (R − r)²),
        // β = asin((R − r)/d); area = (R + r)·L + R²(π + 2β)/2 + r²(π − 2β)/2 (two right trapezoids
        // and two sectors; plane geometry). d = 10, R = 18, r = 9: L = √19, β = asin 0.9.
        // y-extent: from min(0 − 9, 10 − 18) = −9 to 10 + 18 = 28, i.e. 37.
        // A_D = 27·√19 + 162(π + 2β) + 40.5(π − 2β) + 740 = 1765.966 m² (hand).
        double beta = Math.asin(0.9);
        double exact = 27 * Math.sqrt(19) + 162 * (Math.PI + 2 * beta) + 40.5 * (Math.PI - 2 * beta) + 20 * 37;
        Structure s = new Structure("s", "s", box(0, 0, 20, 10), 3, new RoofShape.Shed(6, 0));
        CollectionArea a = CollectionAreaOp.ofStructures(List.of(s));

        assertThat(exact).isCloseTo(1765.966, within(1e-3));
        assertWithinStatedBound(a, exact);
        // the stated bound of a site with a pitched roof stays small
        assertThat(a.maxRelativeError()).isLessThan(2e-3);
    }

    @Test
    void hipRoofZoneLiesBetweenEavesAndRidgeHeights() {
        // 30 × 10 m hip roof, walls 5 m, ridge 8 m: every roof point is between 5 and 8 m tall, so the
        // zone lies between the footprint's zones at 5 m and at 8 m (rectangle formula, hand bounds).
        // The ridge, a segment from (5, 5) to (25, 5) at 8 m (equal slopes from every eave reach
        // 8 m at distance 5 from the long sides), gives a stadium 20·48 + 576π that the zone contains.
        Structure s = new Structure("h", "h", box(0, 0, 30, 10), 5, new RoofShape.Hip(8));
        double area = CollectionAreaOp.ofStructures(List.of(s)).area();

        assertThat(area).isGreaterThan(CollectionAreaOp.rectangleFormula(30, 10, 5));
        assertThat(area).isLessThan(CollectionAreaOp.rectangleFormula(30, 10, 8));
        assertThat(area).isGreaterThan((20 * 48 + 576 * Math.PI) * (1 - CollectionAreaOp.MAX_RELATIVE_ERROR));
    }

    static java.util.stream.Stream<org.junit.jupiter.params.provider.Arguments> pitchedRoofs() {
        String square = "POLYGON((0 0, 30 0, 30 30, 0 30, 0 0))";
        String courtyard = "POLYGON((0 0, 30 0, 30 30, 0 30, 0 0), (10 10, 10 20, 20 20, 20 10, 10 10))";
        String ell = "POLYGON((0 0, 24 0, 24 8, 8 8, 8 24, 0 24, 0 0))";
        List<RoofShape> roofs = List.of(new RoofShape.Gable(11, 90), new RoofShape.Gable(11, 30), new RoofShape.Hip(11),
                new RoofShape.Shed(11, 0), new RoofShape.Shed(11, 225));
        java.util.List<org.junit.jupiter.params.provider.Arguments> cases = new java.util.ArrayList<>();
        for (String footprint : List.of(square, courtyard, ell)) {
            for (RoofShape roof : roofs) {
                if (roof instanceof RoofShape.Hip && !footprint.equals(square)) {
                    continue; // hip roofs need a convex footprint
                }
                cases.add(org.junit.jupiter.params.provider.Arguments.of(footprint, roof));
            }
        }
        return cases.stream();
    }

    @ParameterizedTest(name = "{1} on {0}")
    @org.junit.jupiter.params.provider.MethodSource("pitchedRoofs")
    void pitchedRoofZoneLiesBetweenTheFlatZonesAtWallAndRidgeHeight(String footprint, RoofShape roof) {
        // Every roof point stands between the wall top (5 m) and the ridge or high side (11 m), and
        // the roof covers the whole footprint, so the exact zone contains the footprint's zone at
        // 5 m and lies inside its zone at 11 m (monotonicity of the union of discs in the radius).
        Geometry shape = wkt(footprint);
        double area = CollectionAreaOp.ofStructures(List.of(new Structure("p", "p", shape, 5, roof))).area();
        double low = CollectionAreaOp.ofStructures(List.of(new Structure("p", "p", shape, 5, new RoofShape.Flat(0)))).area();
        double high = CollectionAreaOp.ofStructures(List.of(new Structure("p", "p", shape, 11, new RoofShape.Flat(0)))).area();

        assertThat(area).isGreaterThanOrEqualTo(low * (1 - CollectionAreaOp.MAX_RELATIVE_ERROR));
        assertThat(area).isLessThan(high);
    }

    @Test
    void lShapedBuildingMatchesHandCalculation() {
        // L of arms [0,20]×[0,10] and [0,10]×[0,20], 2 m tall, so r = 6 m; notch [10,20]×[10,20].
        // Footprint 300 m², perimeter 80 m (as the 20 × 20 square).
        // Edge strips: 80 · 6 = 480, minus the r × r = 36 square where the two strips at the
        // re-entrant corner (10,10) overlap; five convex right-angled corners add quarter discs
        // 5 · π·36/4 = 45π. The arms are wider than r, so nothing else overlaps:
        // A_D = 300 + 480 − 36 + 45π = 744 + 45π = 885.3717 m² (hand).
        Structure l = new Structure("L", "L", wkt("POLYGON((0 0, 20 0, 20 10, 10 10, 10 20, 0 20, 0 0))"), 2,
                new RoofShape.Flat(0));
        double area = CollectionAreaOp.ofStructures(List.of(l)).area();

        assertWithinBufferError(area, 744 + 45 * Math.PI);
        assertThat(area).isCloseTo(744 + 5 * inscribedQuarter(6), within(1e-6));
    }

    @Test
    void steppedBuildingIsTallZonePlusLowWingOutsideIt() {
        // Tall block [0,20]×[0,20], 10 m → r = 30: its zone is 400 + 2·30·40 + 900π = 2800 + 900π.
        // Low wing [20,80]×[7,13] beside it, 2 m → r = 6: its zone spans y ∈ [1,19], x ∈ [14,86].
        // For y ∈ [0,20] the tall zone ends at the straight line x = 50, so the wing's zone is inside
        // it on three sides and sticks out east of x = 50 as the rectangle [50,80]×[1,19] = 540 plus
        // the rounded end: strip [80,86]×[7,13] = 36 and two quarter discs of r 6 = 18π.
        // A_D = 2800 + 900π + 540 + 36 + 18π = 3376 + 918π = 6259.9821 m² (hand).
        CollectionArea a = CollectionAreaOp.ofStructures(List.of(flat("tall", 0, 0, 20, 20, 10), flat("wing", 20, 7, 80, 13, 2)));

        assertWithinBufferError(a.area(), 3376 + 918 * Math.PI);
        // the same decomposition holds for the inscribed buffers (the tall zone's east edge is straight)
        assertThat(a.area()).isCloseTo(2800 + 4 * inscribedQuarter(30) + 576 + 2 * inscribedQuarter(6), within(1e-6));
        assertThat(a.zone().getNumGeometries()).isEqualTo(1);
    }

    @Test
    void tallChimneyOnLowRoofWidensTheZoneAroundIt() {
        // 10 × 10 m building 3 m tall (zone 100 + 2·9·20 + 81π = 460 + 81π = 714.47 m²) with a
        // 1 × 1 m chimney at the centre reaching 15 m: its zone (1 + 4·45 + 2025π ≈ 6542.7 m², hand)
        // contains the building's, so the site's A_D is the chimney's.
        Site site = new Site("s", List.of(flat("b", 0, 0, 10, 10, 3)),
                List.of(new RooftopObject("c", "chimney", box(4.5, 4.5, 5.5, 5.5), 15)), List.of(), List.of());

        double area = CollectionAreaOp.of(site).area();

        assertWithinBufferError(area, CollectionAreaOp.rectangleFormula(1, 1, 15));
        assertThat(CollectionAreaOp.ofStructures(site.structures()).area()).isLessThan(area);
    }

    @Test
    void emptySiteHasNoArea() {
        CollectionArea a = CollectionAreaOp.of(new Site("empty", List.of(), List.of(), List.of(), List.of()));

        assertThat(a.area()).isZero();
        assertThat(a.zone().isEmpty()).isTrue();
    }
}

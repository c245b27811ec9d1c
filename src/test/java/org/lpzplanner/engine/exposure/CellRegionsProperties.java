package org.lpzplanner.engine.exposure;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.LongStream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.union.CascadedPolygonUnion;
import org.lpzplanner.engine.envelope.Grid;

/**
 * The traced outline of marked cells covers exactly the cells: it is a valid (multi)polygon equal,
 * as a point set, to the union JTS's own overlay makes of the cell squares, on random cell sets
 * full of cells that meet only at a corner, holes, and islands in holes (fixed seeds).
 */
class CellRegionsProperties {

    static LongStream seeds() {
        return LongStream.range(0, 40).map(k -> 20_261_301L + 31 * k);
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void outlineEqualsTheOverlayUnionOfTheCells(long seed) {
        Random rnd = new Random(seed);
        Grid grid = new Grid(-3.5, 12.25, 0.5, 4 + rnd.nextInt(30), 4 + rnd.nextInt(30));
        boolean[] marked = new boolean[grid.nx() * grid.ny()];
        double density = 0.2 + rnd.nextDouble() * 0.7;
        int i0 = rnd.nextInt(3), j0 = rnd.nextInt(3), i1 = grid.nx() - 1 - rnd.nextInt(3), j1 = grid.ny() - 1 - rnd.nextInt(3);
        GeometryFactory gf = new GeometryFactory();
        List<Polygon> squares = new ArrayList<>();
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                marked[j * grid.nx() + i] = rnd.nextDouble() < density;
                if (marked[j * grid.nx() + i] && i >= i0 && i <= i1 && j >= j0 && j <= j1) {
                    double x = grid.x0() + i * grid.h(), y = grid.y0() + j * grid.h(), h = grid.h();
                    squares.add(gf.createPolygon(new Coordinate[] {new Coordinate(x, y), new Coordinate(x + h, y),
                        new Coordinate(x + h, y + h), new Coordinate(x, y + h), new Coordinate(x, y)}));
                }
            }
        }
        Geometry traced = new CellRegions(grid, gf).union(marked, i0, j0, i1, j1);
        assertThat(traced.isValid()).as("valid: %s", traced).isTrue();
        if (squares.isEmpty()) {
            assertThat(traced.isEmpty()).isTrue();
            return;
        }
        Geometry overlay = CascadedPolygonUnion.union(squares);
        assertThat(traced.getArea()).isCloseTo(squares.size() * grid.h() * grid.h(), org.assertj.core.data.Offset.offset(1e-9));
        assertThat(traced.symDifference(overlay).getArea()).as("area covered by one only").isLessThan(1e-9);
    }
}

package org.lpzplanner.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * A seeded, invented district for benchmarks: buildings on a jittered block grid with mixed
 * heights (4–45 m, a few towers up to 90 m) and all four roof forms, plus a few rods.
 */
public final class DistrictGenerator {

    private DistrictGenerator() {
    }

    public static Site district(int buildings, double extent, long seed) {
        Random rnd = new Random(seed);
        GeometryFactory gf = new GeometryFactory();
        int perSide = (int) Math.ceil(Math.sqrt(buildings));
        double pitch = extent / perSide;
        List<Structure> structures = new ArrayList<>();
        List<Rod> rods = new ArrayList<>();
        for (int k = 0; k < buildings; k++) {
            int gx = k % perSide, gy = k / perSide;
            double w = pitch * (0.35 + 0.3 * rnd.nextDouble()), d = pitch * (0.3 + 0.3 * rnd.nextDouble());
            double x = gx * pitch + rnd.nextDouble() * (pitch - w), y = gy * pitch + rnd.nextDouble() * (pitch - d);
            double h = rnd.nextDouble() < 0.05 ? 60 + 30 * rnd.nextDouble() : 4 + 41 * rnd.nextDouble() * rnd.nextDouble();
            RoofShape roof = switch (k % 5) {
                case 0, 1 -> new RoofShape.Flat(rnd.nextDouble() < 0.5 ? 0 : 1);
                case 2 -> new RoofShape.Gable(h + 2 + 4 * rnd.nextDouble(), rnd.nextDouble() < 0.5 ? 0 : 90);
                case 3 -> new RoofShape.Hip(h + 2 + 3 * rnd.nextDouble());
                default -> new RoofShape.Shed(h + 1 + 2 * rnd.nextDouble(), 90 * rnd.nextInt(4));
            };
            Polygon p = gf.createPolygon(new Coordinate[] {new Coordinate(x, y), new Coordinate(x + w, y),
                new Coordinate(x + w, y + d), new Coordinate(x, y + d), new Coordinate(x, y)});
            structures.add(new Structure("D" + k, "Block " + k, p, h, roof));
            if (k % 10 == 0 && roof instanceof RoofShape.Flat) {
                rods.add(new Rod("R" + k, "Rod " + k, x + w / 2, y + d / 2, 2));
            }
        }
        return new Site("Generated district", structures, List.of(), rods, List.of());
    }
}

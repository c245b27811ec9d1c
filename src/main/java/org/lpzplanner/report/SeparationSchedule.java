package org.lpzplanner.report;

import static org.lpzplanner.report.ReportFacts.metres;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.operation.distance.DistanceOp;
import org.lpzplanner.engine.design.SeparationDistance;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.model.RooftopObject;

/**
 * Separation distance between every rooftop object and the nearest point of the air-termination
 * (rod tips and conductor vertices), s = k<sub>i</sub>·(k<sub>c</sub>/k<sub>m</sub>)·l
 * [IEC 62305-3:2010 6.3], in air, with k<sub>c</sub> from the number of down-conductors planned for
 * the structure below. The site file gives no bonding points, so l is taken as the height of the
 * LPS point above ground: s is then a lower bound and a check can fail but never pass ("not
 * confirmed") until the designer gives the real length. Metal installations the designer marked
 * for the site follow the rooftop objects, with the insulation material marked for them.
 */
final class SeparationSchedule {

    static final String TITLE = "Schedule of separation distances";

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private SeparationSchedule() {
    }

    static List<ReportBlock> blocks(ReportFacts facts) {
        List<Named> lps = new ArrayList<>();
        for (SiteSurface.PlacedRod r : facts.surface().rods()) {
            lps.add(new Named(facts.partNumbers().get(r.rod().id()), r.tip()));
        }
        for (SiteSurface.PlacedConductor c : facts.surface().conductors()) {
            c.path().forEach(p -> lps.add(new Named(facts.partNumbers().get(c.conductor().id()), p)));
        }
        List<StoredDesign.Installation> metals = facts.design().installations();
        if ((facts.site().rooftopObjects().isEmpty() && metals.isEmpty()) || lps.isEmpty()) {
            return List.of(new ReportBlock.Heading(TITLE, 2), new ReportBlock.Paragraph(
                    "No separation distance to check: the site file holds "
                            + (lps.isEmpty() ? "no air-termination parts." : "no rooftop objects and the site has"
                                    + " no metal installations marked.")));
        }
        List<List<String>> rows = new ArrayList<>();
        for (RooftopObject o : facts.site().rooftopObjects()) {
            Coordinate best = null;
            Named nearest = null;
            double bestDistance = Double.POSITIVE_INFINITY;
            for (Named n : lps) {
                Coordinate[] closest = DistanceOp.nearestPoints(o.footprint(), GEOMETRY.createPoint(n.point()));
                Coordinate installation = new Coordinate(closest[0].x, closest[0].y, o.top());
                double d = installation.distance3D(n.point());
                if (d < bestDistance) {
                    bestDistance = d;
                    best = installation;
                    nearest = n;
                }
            }
            var centre = o.footprint().getCentroid().getCoordinate();
            rows.add(row(facts, o.name(), "air", SeparationDistance.Material.AIR, best, nearest, centre));
        }
        for (StoredDesign.Installation m : metals) {
            Coordinate point = new Coordinate(m.x(), m.y(), m.z());
            Named nearest = null;
            for (Named n : lps) {
                if (nearest == null || point.distance3D(n.point()) < point.distance3D(nearest.point())) {
                    nearest = n;
                }
            }
            SeparationDistance.Material material = SeparationDistance.Material.valueOf(m.material());
            rows.add(row(facts, "Metal installation: " + m.name(), material == SeparationDistance.Material.AIR
                    ? "air" : "concrete or brick", material, point, nearest, point));
        }
        List<String> notes = new ArrayList<>();
        notes.add("s = ki·(kc/km)·l, IEC 62305-3:2010 6.3 (the 2024 edition revised this method); km = 1 in air,"
                + " 0.5 in concrete or brick (Table 11). The site file names no bonding points, so l is the height"
                + " of the part's point above ground, the shortest path possible: s is a lower bound and no check"
                + " passes until the real length is known (\"not confirmed\").");
        if (!metals.isEmpty()) {
            notes.add("Metal installations: marked by the designer for the site, " + facts.design().asStored()
                    + "; they are not part of this revision.");
        }
        return List.of(new Schedule(TITLE, List.of("Object", "Insulation", "Nearest part", "Down-conductors",
                "l (m)", "s required (m)", "Distance (m)", "Result"), List.of(2.0, 0.9, 0.8, 1.1, 0.6, 0.9, 0.8, 1.0),
                rows, notes));
    }

    /** One check between an object's point and the nearest air-termination point. */
    private static List<String> row(ReportFacts facts, String name, String insulation,
            SeparationDistance.Material material, Coordinate object, Named nearest, Coordinate where) {
        int structure = facts.structureAt(where.x, where.y);
        int downConductors = structure < 0 ? 1 : facts.downConductors().get(structure).count();
        SeparationDistance.Result r = SeparationDistance.check(facts.source().sphere().level(), downConductors,
                material, object, nearest.point(), null);
        String verdict = r.actual() < r.required() ? "fails" : r.passes() ? "passes" : "not confirmed";
        return List.of(name, insulation, nearest.number(), String.valueOf(downConductors), metres(r.length()),
                metres(r.required()), metres(r.actual()), verdict);
    }

    private record Named(String number, Coordinate point) {
    }
}

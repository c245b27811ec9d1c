package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.common.Formats;
import org.lpzplanner.engine.design.BondingRoutes;
import org.lpzplanner.engine.design.DownConductorLayout;
import org.lpzplanner.engine.design.SeparationDistance;
import org.lpzplanner.engine.design.SeparationSurvey;

/**
 * Separation distance between every rooftop object (in air) and every metal installation the
 * designer marked for the site, and every point of the protection system,
 * s = k<sub>i</sub>·(k<sub>c</sub>/k<sub>m</sub>)·l [IEC 62305-3:2010 6.3], by the same computation as
 * the design page ({@link SeparationSurvey}); a row shows the worst point, where the distance less s
 * is least. l runs from that point along the drawn rods and
 * conductors (or, where none is drawn, straight across the roof: an assumption the row states) to
 * the report's down-conductors and down them to ground level; k<sub>c</sub> follows the
 * down-conductors the part's drawn conductors join at roof level, which the row names.
 */
final class SeparationSchedule {

    static final String TITLE = "Schedule of separation distances";

    private SeparationSchedule() {
    }

    /** "2 (D1, D2)": how many down-conductors share the current, and which. */
    static String sharing(BondingRoutes.Route route) {
        return route.downConductors() + (route.sharedBy().isEmpty() ? "" : " (" + String.join(", ", route.sharedBy()) + ")");
    }

    static List<ReportBlock> blocks(ReportFacts facts) {
        List<StoredDesign.Installation> metals = facts.design().installations();
        boolean noParts = facts.surface().rods().isEmpty() && facts.surface().conductors().isEmpty();
        if ((facts.site().rooftopObjects().isEmpty() && metals.isEmpty()) || noParts) {
            return List.of(new ReportBlock.Heading(TITLE, 2), new ReportBlock.Paragraph(
                    "No separation distance to check: the site file holds "
                            + (noParts ? "no air-termination parts." : "no rooftop objects and the site has"
                                    + " no metal installations marked.")));
        }
        List<BondingRoutes.DownConductor> downs = new ArrayList<>();
        for (DownConductorLayout layout : facts.downConductors()) {
            for (Coordinate c : layout.positions()) {
                downs.add(new BondingRoutes.DownConductor("D" + (downs.size() + 1), layout.buildingId(), c));
            }
        }
        List<SeparationSurvey.Installation> installations = new ArrayList<>();
        for (StoredDesign.Installation m : metals) {
            installations.add(new SeparationSurvey.Installation(m.name(), new Coordinate(m.x(), m.y(), m.z()),
                    SeparationDistance.Material.valueOf(m.material())));
        }
        List<SeparationSurvey.Check> checks = SeparationSurvey.survey(facts.site(), facts.surface(),
                facts.source().sphere().level(), downs, installations, 0);
        List<List<String>> rows = new ArrayList<>();
        boolean assumed = false;
        boolean unusual = false;
        boolean close = false;
        List<String> elsewhere = new ArrayList<>();
        for (SeparationSurvey.Check c : checks) {
            String name = c.kind().equals("metal installation") ? "Metal installation: " + c.name() : c.name();
            String insulation = c.material() == SeparationDistance.Material.AIR ? "air" : "concrete or brick";
            String number = facts.partNumbers().getOrDefault(c.partId(), c.partId());
            String verdict = c.status().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
            if (c.status() == SeparationSurvey.Status.NOT_CONFIRMED && !c.worst().lowerBound()) {
                elsewhere.add(name + ": " + facts.partNumbers().getOrDefault(c.unconfirmed().partId(),
                        c.unconfirmed().partId()) + " has no drawn route to a down-conductor (l there at least "
                        + Formats.length(c.unconfirmed().result().length()) + " m)");
            }
            close |= c.status() == SeparationSurvey.Status.FAILS && c.result().actual() >= c.result().required();
            assumed |= c.route().basis() == BondingRoutes.Basis.ASSUMED_LINKS;
            unusual |= verdict.equals("connected") || verdict.equals("not confirmed");
            rows.add(List.of(name, insulation, number, sharing(c.route()),
                    Formats.length(c.result().length()), c.route().describe(),
                    Formats.requiredSeparation(c.result().required()),
                    Formats.availableSeparation(c.result().actual()), verdict));
        }
        List<String> notes = new ArrayList<>();
        notes.add("s must hold at every point of the protection system, each with its own l (IEC 62305-3:2010 6.3):"
                + " each row is the worst point of the rods, conductors and down-conductors, where the distance less s"
                + " is least, found to within " + Math.round(SeparationSurvey.TOLERANCE * 1000) + " mm; a row passes only"
                + " when the distance clears s there by more than that.");
        notes.add("s = ki·(kc/km)·l, IEC 62305-3:2010 6.3 (the 2024 edition revised this method); ki from Table 10,"
                + " km = 1 in air, 0.5 in concrete or brick (Table 11), kc 1 / 0.66 / 0.44 for one, two, three or more"
                + " down-conductors sharing the current (Table 12, Annex C, simplified): those the part's drawn"
                + " conductors join at roof level, named in the row (a part joined to one has kc = 1); for a part with"
                + " no drawn route, every down-conductor of the building its assumed route reaches. l runs from"
                + " the point along the drawn rods and conductors, joined where they meet, to the down-conductor of the"
                + " schedule above and down it to bonding at ground level.");
        if (assumed) {
            notes.add("Where no conductor is drawn, the route assumes a straight connection across the roof, the"
                    + " shortest possible: l and s are then lower bounds, so such a row can fail but not pass (\"not"
                    + " confirmed\" when the distance clears that lower bound); draw the installed route to confirm it.");
        }
        if (!elsewhere.isEmpty()) {
            notes.add("Not confirmed although the worst point's route is drawn: " + String.join("; ", elsewhere)
                    + "; its l is only a lower bound until its route is drawn.");
        }
        if (close) {
            notes.add("\"fails\" where the distance shown clears s by less than "
                    + Math.round(SeparationSurvey.TOLERANCE * 1000) + " mm: within the search's tolerance, which counts as"
                    + " failing.");
        }
        if (unusual) {
            notes.add("\"connected\": a part touches the object, which must then be fit to carry lightning current;"
                    + " \"not confirmed\": l is a lower bound (a straight link assumed, or no down-conductor reached)"
                    + " and the distance clears the s it gives.");
        }
        if (!metals.isEmpty()) {
            notes.add("Metal installations: marked by the designer for the site, " + facts.design().asStored()
                    + "; they are not part of this revision.");
        }
        return List.of(new Schedule(TITLE, List.of("Object", "Insulation", "Worst point on", "Down-conductors",
                "l (m)", "Route of l", "s required (m)", "Distance (m)", "Result"),
                List.of(1.5, 0.8, 0.7, 1.25, 0.5, 2.45, 0.8, 0.7, 0.8), rows, notes));
    }
}

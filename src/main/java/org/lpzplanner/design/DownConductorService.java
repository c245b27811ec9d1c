package org.lpzplanner.design;

import java.time.Clock;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.lpzplanner.common.Formats;
import org.lpzplanner.engine.design.BondingRoutes;
import org.lpzplanner.engine.design.Building;
import org.lpzplanner.engine.design.DownConductorLayout;
import org.lpzplanner.engine.design.DownConductorPlan;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.heavywork.HeavyWorkCapacity;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Down-conductors of a stored site, per building ({@link Building}: structures whose footprints
 * overlap or touch): the planned layout on the outline of the whole ({@link DownConductorPlan}), or
 * the positions a designer edited.
 *
 * <p><b>Stored edits.</b> Edited positions are stored per structure id (table
 * down_conductor_positions). A building reads the positions stored under any of its structures
 * ({@link Building#storedPositions}): earlier edits made per structure stay readable, a position
 * stored twice counts once, and one more than {@value DownConductorPlan#EDIT_REACH} m from the
 * building's outline (it stood by a wall that is now inside the building) is left out with a
 * warning. Saving stores the building's positions under its id (its first structure's id) and
 * removes the rows of its other structures; resetting removes them all.
 */
@Service
public class DownConductorService {

    /** Most positions one building may have. */
    static final int MAX_POSITIONS = 500;

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    private final SiteService sites;
    private final DesignRepository store;
    private final Clock clock;
    private final HeavyWorkCapacity capacity;

    public DownConductorService(SiteService sites, DesignRepository store, Clock clock, HeavyWorkCapacity capacity) {
        this.capacity = capacity;
        this.sites = sites;
        this.store = store;
        this.clock = clock;
    }

    /**
     * Down-conductors of one building: planned or edited positions (local metres) and their labels
     * (D1, D2, … numbered through the site in this order, as the separation checks and the report
     * name them).
     *
     * @param buildingId   the building's id: the id of its first structure
     * @param structureIds the ids of its structures
     * @param required     the count the rule asks for (outline and courtyards over 30 m)
     */
    public record DownConductors(String buildingId, List<String> structureIds, String name, double perimeter,
            double typicalSpacing, int required, List<double[]> positions, List<String> labels, boolean edited,
            double height, List<String> warnings) {

        /** The perimeter as pages and report write a length. */
        public String perimeterText() {
            return Formats.length(perimeter);
        }

        /** The typical spacing of the level as pages and report write a length. */
        public String typicalSpacingText() {
            return Formats.length(typicalSpacing);
        }
    }

    public List<DownConductors> list(long siteId) {
        StoredSite stored = sites.get(siteId);
        return list(sites.document(stored).site(), stored);
    }

    /**
     * The layout of every building of the site, planned over the whole site within the instance's
     * {@link HeavyWorkCapacity} (a save or reset that finds no place stores nothing).
     */
    List<DownConductors> list(Site site, StoredSite stored) {
        return capacity.run("down-conductor layout", () -> layout(site, stored));
    }

    private List<DownConductors> layout(Site site, StoredSite stored) {
        double spacing = stored.sphere().level().downConductorSpacing();
        Map<String, List<Coordinate>> edited = new LinkedHashMap<>();
        store.downConductors(stored.id()).forEach((structure, positions) -> edited.put(structure,
                positions.stream().map(p -> new Coordinate(p[0], p[1])).toList()));
        List<DownConductors> out = new ArrayList<>();
        int number = 0;
        for (DownConductorLayout planned : DownConductorPlan.planSite(site, stored.sphere())) {
            Building b = planned.building();
            Building.StoredPositions kept = b.storedPositions(edited);
            List<double[]> positions = new ArrayList<>();
            for (Coordinate c : kept.edited() ? kept.positions() : planned.positions()) {
                positions.add(kept.edited() ? new double[] {c.x, c.y} : new double[] {round(c.x), round(c.y)});
            }
            List<String> labels = new ArrayList<>();
            for (int k = 0; k < positions.size(); k++) {
                labels.add("D" + (++number));
            }
            List<String> warnings = new ArrayList<>();
            if (positions.size() < planned.required()) {
                warnings.add(positions.size() + " down-conductors, fewer than the " + planned.required() + " a perimeter of "
                        + Formats.length(planned.perimeter()) + " m needs at " + Formats.length(spacing)
                        + " m typical spacing");
            }
            if (!kept.edited() && planned.exceedsTypicalSpacing()) {
                warnings.add("one gap along the outline is " + Formats.length(planned.largestSpacing())
                        + " m, longer than the typical spacing of " + Formats.length(spacing) + " m");
            }
            for (Coordinate c : kept.dropped()) {
                warnings.add("the stored position (" + Formats.coordinate(c.x) + ", " + Formats.coordinate(c.y)
                        + ") is more than " + Formats.length(DownConductorPlan.EDIT_REACH) + " m from the outline of the"
                        + " building as a whole (it stood by a wall inside it) and is left out; save the positions"
                        + " again to keep the list as shown");
            }
            out.add(new DownConductors(b.id(), b.structureIds(), b.name(), round(planned.perimeter()), spacing,
                    planned.required(), positions, labels, kept.edited(), b.height(), warnings));
        }
        return out;
    }

    /**
     * Stores edited positions of one building's down-conductors (at least two, each within
     * {@value DownConductorPlan#EDIT_REACH} m of its outline).
     *
     * @param buildingOrStructureId the building's id or the id of any of its structures
     * @throws SiteNotFoundException when the site has no such building or structure
     */
    @Transactional
    public List<DownConductors> save(long siteId, String buildingOrStructureId, List<double[]> positions) {
        StoredSite stored = sites.get(siteId);
        Building building = building(siteId, sites.document(stored).site(), buildingOrStructureId);
        if (positions == null || positions.size() < 2) {
            throw new InvalidInputException("positions", "a building needs at least two down-conductors"
                    + " (IEC 62305-3 5.3); give two or more [x, y] positions");
        }
        if (positions.size() > MAX_POSITIONS) {
            throw new InvalidInputException("positions", "at most " + MAX_POSITIONS + " down-conductors per building");
        }
        Geometry near = building.outline().getBoundary().buffer(DownConductorPlan.EDIT_REACH);
        for (int i = 0; i < positions.size(); i++) {
            double[] p = positions.get(i);
            if (p == null || p.length != 2 || !Double.isFinite(p[0]) || !Double.isFinite(p[1])) {
                throw new InvalidInputException("positions[" + i + "]", "every position must be [x, y] in local metres");
            }
            if (!near.contains(GEOMETRY.createPoint(new Coordinate(p[0], p[1])))) {
                throw new InvalidInputException("positions[" + i + "]", String.format(Locale.ROOT, "the position is more"
                        + " than %.0f m from the outline of %s", DownConductorPlan.EDIT_REACH, building.name()));
            }
        }
        for (String other : building.structureIds()) {
            if (!other.equals(building.id())) {
                store.resetDownConductors(siteId, other);
            }
        }
        store.saveDownConductors(siteId, building.id(), positions, clock.instant());
        return list(siteId);
    }

    /** Back to the planned layout: removes the positions stored for any structure of the building. */
    @Transactional
    public List<DownConductors> reset(long siteId, String buildingOrStructureId) {
        StoredSite stored = sites.get(siteId);
        Building building = building(siteId, sites.document(stored).site(), buildingOrStructureId);
        for (String id : building.structureIds()) {
            store.resetDownConductors(siteId, id);
        }
        return list(siteId);
    }

    private static Building building(long siteId, Site site, String id) {
        return Building.of(site).stream().filter(b -> b.answersTo(id)).findFirst()
                .orElseThrow(() -> new SiteNotFoundException(siteId, "site " + siteId + " has no building or structure \""
                        + id + "\""));
    }

    /** Every down-conductor with its label and building, as the l routes need them. */
    static List<BondingRoutes.DownConductor> forRoutes(List<DownConductors> downs) {
        List<BondingRoutes.DownConductor> out = new ArrayList<>();
        for (DownConductors d : downs) {
            for (int k = 0; k < d.positions().size(); k++) {
                double[] p = d.positions().get(k);
                out.add(new BondingRoutes.DownConductor(d.labels().get(k), d.buildingId(), new Coordinate(p[0], p[1])));
            }
        }
        return out;
    }

    static double round(double v) {
        return Math.round(v * 100) / 100.0;
    }
}

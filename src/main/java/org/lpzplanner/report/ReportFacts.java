package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.lpzplanner.analysis.ReviewItems;
import org.lpzplanner.engine.design.Building;
import org.lpzplanner.engine.design.DownConductorLayout;
import org.lpzplanner.engine.design.DownConductorPlan;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * What every part of a report reads: the source revision, the site read back from its stored file,
 * the engine's surface and envelope for that file, the review items of the stored result and the
 * numbers the report gives parts and down-conductors. Built once per report by
 * {@link ReportAssembler}; a schedule or section added later takes what it needs from here.
 *
 * @param site            the site as the analysis read it
 * @param surface         the engine's surface of that site
 * @param field           the protection envelope at the revision's sphere and resolution
 * @param items           the review items of the stored result, numbered as the review list numbers them
 * @param partNumbers     "A1", "A2", … by part id: rods in file order, then conductors
 * @param downConductors  the down-conductors of each building (structures whose footprints overlap or
 *                        touch), in order of their first structures: the designer's edited positions
 *                        where the site stores them, else the planned layout
 * @param design          the site's stored design data (edited down-conductors, metal installations)
 */
public record ReportFacts(ReportSource source, Site site, SiteSurface surface, EnvelopeField field,
        StoredResult stored, List<ReviewItems.Item> items, Map<String, String> partNumbers,
        List<DownConductorLayout> downConductors, StoredDesign design) {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    public ReportFacts {
        items = List.copyOf(items);
        partNumbers = Map.copyOf(partNumbers);
        downConductors = List.copyOf(downConductors);
    }

    static ReportFacts of(ReportSource source, Site site, SiteSurface surface, EnvelopeField field,
            StoredResult stored, StoredDesign design) {
        Map<String, String> numbers = new LinkedHashMap<>();
        for (Rod r : site.rods()) {
            numbers.put(r.id(), "A" + (numbers.size() + 1));
        }
        for (Conductor c : site.conductors()) {
            numbers.put(c.id(), "A" + (numbers.size() + 1));
        }
        // planned as the design page plans them, so the report and the page show the same positions; edits
        // stored per structure are read for the building as a whole, as the page reads them
        List<DownConductorLayout> layouts = new ArrayList<>(DownConductorPlan.planSite(site, source.sphere()));
        for (int i = 0; i < layouts.size(); i++) {
            Building b = layouts.get(i).building();
            Building.StoredPositions edited = b.storedPositions(design.downConductors());
            if (edited.edited()) {
                layouts.set(i, DownConductorPlan.edited(b, layouts.get(i).typicalSpacing(), edited.positions()));
            }
        }
        return new ReportFacts(source, site, surface, field, stored, stored.items(), numbers, layouts, design);
    }

    /** True when the designer's edited positions stand for the building at this index of {@link #downConductors}. */
    public boolean edited(int building) {
        return downConductors.get(building).building().storedPositions(design.downConductors()).edited();
    }

    /** The number of items a designer accepted (model warnings included). */
    public int acceptedCount() {
        return (int) items.stream().filter(i -> source.accepted().containsKey(i.key())).count();
    }

    /** The exposed edges, corners and facade bands among the items (no model warnings). */
    public List<ReviewItems.Item> exposedItems() {
        return items.stream().filter(i -> !i.isModelWarning()).toList();
    }

    /** The number of exposed edges, corners and facade bands a designer accepted. */
    public int acceptedExposedCount() {
        return (int) exposedItems().stream().filter(i -> source.accepted().containsKey(i.key())).count();
    }

    /** What stands at (x, y): a rooftop object's or structure's name, or null for open ground. */
    public String standsOn(double x, double y) {
        var point = GEOMETRY.createPoint(new Coordinate(x, y));
        for (RooftopObject o : site.rooftopObjects()) {
            if (o.footprint().covers(point)) {
                return o.name();
            }
        }
        for (Structure s : site.structures()) {
            if (s.footprint().covers(point)) {
                return s.name();
            }
        }
        return null;
    }

    /** The index of the structure whose footprint covers (x, y), or -1. */
    public int structureAt(double x, double y) {
        var point = GEOMETRY.createPoint(new Coordinate(x, y));
        for (int i = 0; i < site.structures().size(); i++) {
            if (site.structures().get(i).footprint().covers(point)) {
                return i;
            }
        }
        return -1;
    }
}

package org.lpzplanner.design;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.common.ReportSection;
import org.lpzplanner.engine.design.quantities.BillOfQuantities;
import org.lpzplanner.engine.design.quantities.QuantityTable;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.heavywork.HeavyWorkCapacity;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.stereotype.Service;

/**
 * The bill of quantities of a stored site as it is: its rods and conductors and its down-conductors
 * ({@link DownConductorService}), for the design page, its CSV and any report writer. Computed within
 * the instance's {@link HeavyWorkCapacity}.
 */
@Service
public class QuantityService {

    private final SiteService sites;
    private final DownConductorService downConductors;
    private final HeavyWorkCapacity capacity;

    public QuantityService(SiteService sites, DownConductorService downConductors, HeavyWorkCapacity capacity) {
        this.capacity = capacity;
        this.sites = sites;
        this.downConductors = downConductors;
    }

    /** @throws InvalidInputException when {@code fixingsPerMetre} is not between 0 and 20 */
    public QuantityTable quantities(long siteId, double fixingsPerMetre) {
        if (!(fixingsPerMetre >= 0 && fixingsPerMetre <= 20)) {
            throw new InvalidInputException("fixingsPerMetre", "fixings per metre must be between 0 and 20, got " + fixingsPerMetre);
        }
        StoredSite stored = sites.get(siteId);
        Site site = sites.document(stored).site();
        return capacity.run("bill of quantities", () -> {
            List<Coordinate> positions = new ArrayList<>();
            for (DownConductorService.DownConductors d : downConductors.list(site, stored)) {
                d.positions().forEach(p -> positions.add(new Coordinate(p[0], p[1])));
            }
            QuantityTable table = BillOfQuantities.table(BillOfQuantities.compute(site, positions, fixingsPerMetre));
            capacity.checkBudget();
            return table;
        });
    }

    /**
     * The bill of quantities as a report section (the table as on the page, the basis of the
     * counts as notes), for any report writer.
     */
    public ReportSection quantitiesSection(long siteId, double fixingsPerMetre) {
        QuantityTable table = quantities(siteId, fixingsPerMetre);
        return new ReportSection(table.title(), table.columns(), table.rows(), List.of(
                "Down-conductor lengths run from the air-termination level at the top of the wall (parapet, eaves or verge)"
                        + " straight down to ground level; the installed route may be longer, and the connection to the"
                        + " earth termination is not included.",
                "Test joints and earth terminations: one per down-conductor (common practice)."));
    }
}

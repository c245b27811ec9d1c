package org.lpzplanner.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.common.Formats;
import org.lpzplanner.engine.design.BondingRoutes;
import org.lpzplanner.engine.design.SeparationDistance;
import org.lpzplanner.engine.design.SeparationSurvey;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.heavywork.HeavyWorkCapacity;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.stereotype.Service;

/**
 * Separation distances of a stored site (IEC 62305-3:2010 6.3) at every point of its protection
 * system, to its other parts and the metal installations stored for it, over its down-conductors
 * ({@link DownConductorService}); see docs/design-checks.md. Nothing is stored. The survey runs
 * within the instance's {@link HeavyWorkCapacity} (the engine's survey has no hook to stop it
 * midway; the time budget is checked when it ends).
 */
@Service
public class SeparationService {

    /** Height of the equipotential bonding the separation distances run to: ground level (sites store no other). */
    static final double BONDING_LEVEL = 0;

    private final SiteService sites;
    private final DesignRepository store;
    private final DownConductorService downConductors;
    private final HeavyWorkCapacity capacity;

    public SeparationService(SiteService sites, DesignRepository store, DownConductorService downConductors,
            HeavyWorkCapacity capacity) {
        this.capacity = capacity;
        this.sites = sites;
        this.store = store;
        this.downConductors = downConductors;
    }

    /**
     * One separation distance check, at the worst point of the system ({@code lpsPoint}, on part
     * {@code partId}: a rod, conductor or down-conductor; where distance − s is least), with the
     * installation's point nearest it. {@code length} is l there, {@code route} says how it was found
     * ({@code routeBasis}: drawn, assumed-links, grounded-part or none), {@code straightAcross} the
     * metres of it assumed straight across the roof where no conductor is drawn; {@code downConductors}
     * the number the current shares between and {@code sharedBy} which (labels as in the
     * down-conductor list; parts standing on the ground by id), giving {@code kc}; {@code status} is
     * "passes", "fails", "not confirmed" (it clears, but l is only a lower bound somewhere: at the worst
     * point, or on the part {@code unconfirmedPartId} that has no drawn route) or "connected" (a part
     * touches the object).
     */
    public record Separation(String kind, String name, double[] installation, double[] lpsPoint, String partId,
            double actual, double length, String routeBasis, String route, double straightAcross, int downConductors,
            List<String> sharedBy, double kc, String material, double required, boolean passes, String status,
            String unconfirmedPartId, String note) {

        /** "0.66 (D1, D2)": k<sub>c</sub> and the down-conductors behind it. */
        public String kcText() {
            return String.format(Locale.ROOT, "%.2f", kc) + (sharedBy.isEmpty() ? "" : " (" + String.join(", ", sharedBy) + ")");
        }
    }

    /**
     * @throws org.lpzplanner.heavywork.HeavyWorkBusyException when no place for long computations came
     *         free within the wait
     */
    public List<Separation> separations(long siteId) {
        StoredSite stored = sites.get(siteId);
        return capacity.run("separation survey", () -> separations(stored));
    }

    private List<Separation> separations(StoredSite stored) {
        long siteId = stored.id();
        Site site = sites.document(stored).site();
        List<DesignRepository.Installation> stores = store.installations(siteId);
        List<SeparationSurvey.Installation> metals = new ArrayList<>();
        for (DesignRepository.Installation i : stores) {
            metals.add(new SeparationSurvey.Installation(i.name(), new Coordinate(i.x(), i.y(), i.z()),
                    SeparationDistance.Material.valueOf(i.material())));
        }
        List<SeparationSurvey.Check> checks = SeparationSurvey.survey(site, SiteSurfaceBuilder.build(site),
                stored.sphere().level(), DownConductorService.forRoutes(downConductors.list(site, stored)), metals,
                BONDING_LEVEL);
        capacity.checkBudget();
        List<Separation> out = new ArrayList<>();
        int metal = 0;
        for (SeparationSurvey.Check c : checks) {
            String kind = c.kind();
            if (kind.equals("metal installation")) {
                kind = "metal installation #" + stores.get(metal++).id();
            }
            out.add(separation(kind, c));
        }
        return out;
    }

    private static Separation separation(String kind, SeparationSurvey.Check c) {
        BondingRoutes.Route route = c.route();
        SeparationSurvey.Point u = c.unconfirmed();
        String note;
        if (c.connected()) {
            note = "a part touches it: it is connected to the air-termination, so it must be fit to carry lightning"
                    + " current; no clearance to check";
        } else if (route.basis() == BondingRoutes.Basis.ASSUMED_LINKS) {
            note = "part of l is assumed straight across the roof where no conductor is drawn, the shortest a"
                    + " route can be: l is a lower bound, so the check can fail but not pass until the route is drawn";
        } else if (route.basis() == BondingRoutes.Basis.NONE) {
            note = "no down-conductor reached: l is only a lower bound, so the check cannot pass";
        } else if (c.status() == SeparationSurvey.Status.NOT_CONFIRMED) {
            note = "it clears s at every point, but " + u.partId() + " has no drawn route to a down-conductor (there l is"
                    + " at least " + Formats.length(u.result().length()) + " m): not confirmed until its route is drawn";
        } else {
            note = "l along the drawn air-termination and down the down-conductor";
        }
        if (c.status() == SeparationSurvey.Status.FAILS && c.result().actual() >= c.result().required()) {
            note += String.format(Locale.ROOT, "; within %.0f mm of s, which counts as failing",
                    SeparationSurvey.TOLERANCE * 1000);
        }
        if (!c.connected()) {
            note = "worst point of the system (on " + c.partId() + "): " + note;
        }
        String status = c.status().name().toLowerCase(Locale.ROOT).replace('_', ' ');
        Coordinate p = c.installation(), q = c.lpsPoint();
        return new Separation(kind, c.name(), new double[] {round(p.x), round(p.y), round(p.getZ())},
                new double[] {round(q.x), round(q.y), round(q.getZ())}, c.partId(), Formats.availableSeparationValue(c.result().actual()),
                round(c.result().length()), route.basis().name().toLowerCase(Locale.ROOT).replace('_', '-'),
                route.describe(), round(route.assumedStraight()), route.downConductors(), route.sharedBy(),
                SeparationDistance.kc(route.downConductors()), c.material().name(),
                Formats.requiredSeparationValue(c.result().required()), c.passes(), status,
                u == null ? null : u.partId(), note);
    }

    private static double round(double metres) {
        return Centimetres.round(metres);
    }
}

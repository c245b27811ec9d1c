package org.lpzplanner.airtermination;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.geom.EdgeKind;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.io.LocalProjection;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.stereotype.Service;

/**
 * The air-termination parts of a stored site as the API and the plan editor show them: rods and
 * conductors in local metres and in the file's own coordinates, and the parapets' lines on which a
 * part stands on the parapet's top. Positions are rounded to the millimetre (lon/lat to 10⁻⁸ degree).
 */
@Service
public class PartsView {

    private final SiteService sites;

    public PartsView(SiteService sites) {
        this.sites = sites;
    }

    /** A rod: plan position in local metres and in the file's own coordinates, height above what it stands on. */
    public record RodView(String id, String name, double x, double y, double[] sitePosition, double height) {
    }

    /** A conductor: its path in local metres ([x, y] or [x, y, z]) and in the file's own coordinates. */
    public record ConductorView(String id, String name, List<double[]> path, List<double[]> sitePath,
            Double heightAboveRoof) {
    }

    /**
     * The parts of a site. {@code coordinates} is {@code "lon-lat"} or {@code "local-metres"}, the
     * file's own; {@code editable} says whether parts can be placed (GeoJSON files only);
     * {@code parapets} are the parapets' lines, on which a part stands on the parapet's top.
     */
    public record Parts(long siteId, long version, String coordinates, boolean editable, List<RodView> rods,
            List<ConductorView> conductors, List<ParapetLine> parapets) {
    }

    /** A parapet's line in local metres and its top above ground, for placing parts on it. */
    public record ParapetLine(String structure, double x0, double y0, double x1, double y1, double top) {
    }

    /** @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id */
    public Parts parts(long siteId) {
        StoredSite site = sites.get(siteId);
        SiteDocument document = sites.document(site);
        LocalProjection projection = document.projection();
        List<RodView> rods = document.site().rods().stream().map(r -> view(r, projection)).toList();
        List<ConductorView> conductors = document.site().conductors().stream().map(c -> view(c, projection)).toList();
        List<ParapetLine> parapets = SiteSurfaceBuilder.build(document.site()).edges().stream()
                .filter(e -> e.kind() == EdgeKind.PARAPET)
                .map(e -> new ParapetLine(e.ownerName(), e.p0().x, e.p0().y, e.p1().x, e.p1().y,
                        Math.max(e.p0().getZ(), e.p1().getZ())))
                .toList();
        return new Parts(site.id(), site.version(), projection == null ? "local-metres" : "lon-lat",
                sites.isGeoJson(site), rods, conductors, parapets);
    }

    static RodView view(Rod r, LocalProjection projection) {
        return new RodView(r.id(), r.name(), round(r.x()), round(r.y()), sitePosition(projection, r.x(), r.y()),
                r.height());
    }

    static ConductorView view(Conductor c, LocalProjection projection) {
        List<double[]> path = new ArrayList<>();
        List<double[]> sitePath = new ArrayList<>();
        for (Coordinate p : c.path()) {
            path.add(Double.isNaN(p.getZ()) || c.followsSurface() ? new double[] {round(p.x), round(p.y)}
                    : new double[] {round(p.x), round(p.y), round(p.getZ())});
            sitePath.add(sitePosition(projection, p.x, p.y));
        }
        return new ConductorView(c.id(), c.name(), path, sitePath, c.heightAboveRoof());
    }

    private static double[] sitePosition(LocalProjection projection, double x, double y) {
        if (projection == null) {
            return new double[] {round(x), round(y)};
        }
        Coordinate lonLat = projection.toLonLat(x, y);
        return new double[] {Math.round(lonLat.x * 1e8) / 1e8, Math.round(lonLat.y * 1e8) / 1e8};
    }

    /** To the millimetre. */
    static double round(double value) {
        return Math.round(value * 1000) / 1000.0;
    }
}

package org.lpzplanner.airtermination;

import java.math.BigDecimal;
import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.engine.geom.EdgeKind;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.io.LocalProjection;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.sites.SiteFiles;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.sites.SiteRepository;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Lists the air-termination parts of a stored site and adds, moves and removes its rods by
 * rewriting the stored GeoJSON file (see {@link PartFileEditor}). Every change is read back through
 * the engine's reader before it is stored, so a bad height or position stores nothing; the file it
 * replaces is kept as an earlier file of the site. WKT files cannot hold rods.
 */
@Service
public class AirTerminationService {

    private final SiteService sites;
    private final SiteRepository rows;
    private final Clock clock;

    private final AuditTrail audit;

    public AirTerminationService(SiteService sites, SiteRepository rows, AuditTrail audit, Clock clock) {
        this.audit = audit;
        this.sites = sites;
        this.rows = rows;
        this.clock = clock;
    }

    /** A rod as the API shows it: plan position in local metres and in the file's own coordinates. */
    public record RodView(String id, String name, double x, double y, double[] sitePosition, double height) {
    }

    /** A conductor: its path in local metres ([x, y] or [x, y, z]) and in the file's own coordinates. */
    public record ConductorView(String id, String name, List<double[]> path, List<double[]> sitePath,
            Double heightAboveRoof) {
    }

    /**
     * The parts of a site. {@code coordinates} is {@code "lon-lat"} or {@code "local-metres"}, the
     * file's own; {@code editable} says whether rods can be placed (GeoJSON files only);
     * {@code parapets} are the parapets' lines, on which a part stands on the parapet's top.
     */
    public record Parts(long siteId, long version, String coordinates, boolean editable, List<RodView> rods,
            List<ConductorView> conductors, List<ParapetLine> parapets) {
    }

    /** A parapet's line in local metres and its top above ground, for placing parts on it. */
    public record ParapetLine(String structure, double x0, double y0, double x1, double y1, double top) {
    }

    /** Values for a new rod or a change; null leaves a value unchanged (or, for a new rod, unset). */
    public record RodInput(String id, String name, Double x, Double y, String height) {
    }

    /** @throws SiteNotFoundException when no site has this id */
    @Transactional(readOnly = true)
    public Parts parts(long siteId) {
        StoredSite site = sites.get(siteId);
        SiteDocument document = sites.document(site);
        LocalProjection projection = document.projection();
        List<RodView> rods = document.site().rods().stream().map(r -> new RodView(r.id(), r.name(), round(r.x()),
                round(r.y()), sitePosition(projection, r.x(), r.y()), r.height())).toList();
        List<ConductorView> conductors = document.site().conductors().stream().map(c -> view(c, projection)).toList();
        List<ParapetLine> parapets = SiteSurfaceBuilder.build(document.site()).edges().stream()
                .filter(e -> e.kind() == EdgeKind.PARAPET)
                .map(e -> new ParapetLine(e.ownerName(), e.p0().x, e.p0().y, e.p1().x, e.p1().y,
                        Math.max(e.p0().getZ(), e.p1().getZ())))
                .toList();
        return new Parts(site.id(), site.version(), projection == null ? "local-metres" : "lon-lat",
                sites.isGeoJson(site), rods, conductors, parapets);
    }

    /**
     * Adds a rod at (x, y) local metres; an id, when given, must not be in use (it lets a removed
     * rod come back under its old id).
     *
     * @return the new rod's id
     * @throws SiteNotFoundException  when no site has this id
     * @throws InvalidInputException  when a value is missing or unusable, or the file is WKT
     * @throws org.lpzplanner.engine.io.SiteFormatException when the changed file is not a valid
     *         site, naming the field
     * @throws OptimisticLockingFailureException when the site is no longer at {@code expectedVersion}
     */
    @Transactional
    public String addRod(long siteId, long expectedVersion, RodInput input) {
        StoredSite site = editable(siteId, expectedVersion);
        if (input.x() == null || input.y() == null) {
            throw new InvalidInputException(input.x() == null ? "x" : "y", "x and y (local metres) are required");
        }
        BigDecimal height = height(input.height() == null ? "1" : input.height());
        checkName(input.name());
        SiteDocument document = sites.document(site);
        Set<String> used = usedIds(document.site());
        String id = newId(used, input.id(), "rod");
        PartFileEditor editor = editor(site, document);
        editor.add(id, input.name(), input.x(), input.y(), height);
        store(site, editor.text());
        audit.record(siteId, "rod-added", "rod " + id + (input.name() == null || input.name().isBlank() ? ""
                : " \"" + input.name().strip() + "\"") + " at x " + round(input.x()) + " m, y " + round(input.y())
                + " m, height " + height.toPlainString() + " m");
        return id;
    }

    /**
     * Adds several rods in one change of the file (one earlier file kept, one new version). Each gets
     * the next free id {@code rod-N}; names and heights as given.
     *
     * @return the new rods' ids, in order
     * @throws InvalidInputException when a value is unusable (nothing is stored then)
     */
    @Transactional
    public List<String> addRods(long siteId, long expectedVersion, List<RodInput> inputs) {
        if (inputs.isEmpty()) {
            throw new InvalidInputException("rods", "there are no rods to add");
        }
        return addParts(siteId, expectedVersion, inputs, List.of(), null, null).rodIds();
    }

    /** Ids of the parts one change added, in the order given. */
    public record AddedParts(List<String> rodIds, List<String> conductorIds) {
    }

    /**
     * Adds rods and conductors in one change of the file (one earlier file kept, one new version),
     * e.g. an accepted proposal: either all of them are stored or, when one value is unusable,
     * none. Rods get the next free ids {@code rod-N}, conductors {@code conductor-N}. When
     * {@code auditEvent} is given, the change is recorded in the site's audit trail once, with
     * {@code auditText}.
     *
     * @throws InvalidInputException when there is nothing to add or a value is unusable
     * @throws OptimisticLockingFailureException when the site is no longer at {@code expectedVersion}
     */
    @Transactional
    public AddedParts addParts(long siteId, long expectedVersion, List<RodInput> rods, List<ConductorInput> conductors,
            String auditEvent, String auditText) {
        StoredSite site = editable(siteId, expectedVersion);
        if (rods.isEmpty() && conductors.isEmpty()) {
            throw new InvalidInputException("parts", "there are no parts to add");
        }
        SiteDocument document = sites.document(site);
        Set<String> used = usedIds(document.site());
        PartFileEditor editor = editor(site, document);
        List<String> rodIds = new ArrayList<>();
        for (int k = 0; k < rods.size(); k++) {
            RodInput input = rods.get(k);
            if (input.x() == null || input.y() == null) {
                throw new InvalidInputException("rods[" + k + "]", "x and y (local metres) are required for every rod");
            }
            checkName(input.name());
            String id = newId(used, null, "rod");
            used.add(id);
            editor.add(id, input.name(), input.x(), input.y(), height(input.height() == null ? "1" : input.height()));
            rodIds.add(id);
        }
        List<String> conductorIds = new ArrayList<>();
        for (ConductorInput input : conductors) {
            BigDecimal heightAboveRoof = checkedConductor(input);
            String id = newId(used, null, "conductor");
            used.add(id);
            editor.addConductor(id, input.name(), input.points(), heightAboveRoof);
            conductorIds.add(id);
        }
        store(site, editor.text());
        if (auditEvent != null) {
            audit.record(siteId, auditEvent, auditText);
        }
        return new AddedParts(rodIds, conductorIds);
    }

    /**
     * Removes the given rods and conductors in one change of the file (one earlier file kept, one new
     * version), e.g. to take back an accepted proposal; every id must still be in the site, else
     * nothing is removed. When {@code auditEvent} is given, the change is recorded once.
     *
     * @throws SiteNotFoundException when a part is no longer in the site
     * @throws OptimisticLockingFailureException when the site is no longer at {@code expectedVersion}
     */
    @Transactional
    public void removeParts(long siteId, long expectedVersion, List<String> rodIds, List<String> conductorIds,
            String auditEvent, String auditText) {
        StoredSite site = editable(siteId, expectedVersion);
        SiteDocument document = sites.document(site);
        List<Integer> rodIndexes = new ArrayList<>();
        for (String id : rodIds) {
            rodIndexes.add(rodIndex(site, document.site(), id));
        }
        List<Integer> conductorIndexes = new ArrayList<>();
        for (String id : conductorIds) {
            int index = -1;
            for (int i = 0; i < document.site().conductors().size(); i++) {
                if (document.site().conductors().get(i).id().equals(id)) {
                    index = i;
                }
            }
            if (index < 0) {
                throw new SiteNotFoundException(site.id(), "site " + site.id() + " has no conductor \"" + id + "\"");
            }
            conductorIndexes.add(index);
        }
        PartFileEditor editor = editor(site, document);
        // from the last to the first, so that the indexes still to remove stay valid
        rodIndexes.stream().distinct().sorted(java.util.Comparator.reverseOrder()).forEach(editor::remove);
        conductorIndexes.stream().distinct().sorted(java.util.Comparator.reverseOrder()).forEach(editor::removeConductor);
        store(site, editor.text());
        if (auditEvent != null) {
            audit.record(siteId, auditEvent, auditText);
        }
    }

    /**
     * Moves a rod to (x, y) local metres and/or changes its height.
     *
     * @return the rod as it was before the change
     * @throws SiteNotFoundException when no site has this id or the site no rod with this id
     */
    @Transactional
    public RodView changeRod(long siteId, long expectedVersion, String rodId, RodInput input) {
        StoredSite site = editable(siteId, expectedVersion);
        if ((input.x() == null) != (input.y() == null)) {
            throw new InvalidInputException(input.x() == null ? "x" : "y", "give both x and y to move a rod");
        }
        if (input.x() == null && input.height() == null) {
            throw new InvalidInputException("x", "give x and y, a height, or both");
        }
        BigDecimal height = input.height() == null ? null : height(input.height());
        SiteDocument document = sites.document(site);
        int index = rodIndex(site, document.site(), rodId);
        RodView before = view(document.site().rods().get(index), document.projection());
        PartFileEditor editor = editor(site, document);
        editor.change(index, input.x(), input.y(), height);
        store(site, editor.text());
        audit.record(siteId, "rod-changed", "rod " + rodId + (input.x() == null ? "" : " moved from x " + before.x()
                + " m, y " + before.y() + " m to x " + round(input.x()) + " m, y " + round(input.y()) + " m")
                + (height == null ? "" : " height " + before.height() + " m to " + height.toPlainString() + " m"));
        return before;
    }

    /**
     * Removes a rod.
     *
     * @return the rod as it was, so that it can be put back
     * @throws SiteNotFoundException when no site has this id or the site no rod with this id
     */
    @Transactional
    public RodView removeRod(long siteId, long expectedVersion, String rodId) {
        StoredSite site = editable(siteId, expectedVersion);
        SiteDocument document = sites.document(site);
        int index = rodIndex(site, document.site(), rodId);
        RodView before = view(document.site().rods().get(index), document.projection());
        PartFileEditor editor = editor(site, document);
        editor.remove(index);
        store(site, editor.text());
        audit.record(siteId, "rod-removed", "rod " + rodId + " at x " + before.x() + " m, y " + before.y() + " m");
        return before;
    }

    /**
     * A new conductor: {@code points} in local metres, each [x, y] (then {@code heightAboveRoof},
     * metres above the surface below, is required) or each [x, y, elevation above ground] (a
     * catenary wire or any conductor given in 3D).
     */
    public record ConductorInput(String id, String name, List<double[]> points, String heightAboveRoof) {
    }

    /**
     * Adds a conductor.
     *
     * @return the new conductor's id
     * @throws InvalidInputException when points or heights are missing or unusable, or the file is WKT
     * @throws org.lpzplanner.engine.io.SiteFormatException when the changed file is not a valid site
     * @throws OptimisticLockingFailureException when the site is no longer at {@code expectedVersion}
     */
    @Transactional
    public String addConductor(long siteId, long expectedVersion, ConductorInput input) {
        StoredSite site = editable(siteId, expectedVersion);
        BigDecimal heightAboveRoof = checkedConductor(input);
        List<double[]> points = input.points();
        SiteDocument document = sites.document(site);
        Set<String> used = usedIds(document.site());
        String id = newId(used, input.id(), "conductor");
        PartFileEditor editor = editor(site, document);
        editor.addConductor(id, input.name(), points, heightAboveRoof);
        store(site, editor.text());
        audit.record(siteId, "conductor-added", "conductor " + id + named(input.name()) + " with "
                + points.size() + " points " + (heightAboveRoof == null ? "at elevations above ground"
                : heightAboveRoof.toPlainString() + " m above the surface"));
        return id;
    }

    /**
     * Moves the vertices of a conductor, or the whole conductor: {@code points} replace its path.
     * Points [x, y] keep a roof conductor's {@code heightAboveRoof} unless a new one is given (and
     * need one when the conductor was a wire); points [x, y, elevation] make it hold those
     * elevations above ground. A given {@code name} renames it. The conductor keeps its id and its
     * place in the file.
     *
     * @return the conductor as it was before the change
     * @throws SiteNotFoundException when no site has this id or the site no conductor with this id
     * @throws InvalidInputException when points or heights are missing or unusable (nothing is stored)
     * @throws OptimisticLockingFailureException when the site is no longer at {@code expectedVersion}
     */
    @Transactional
    public ConductorView changeConductor(long siteId, long expectedVersion, String conductorId, ConductorInput input) {
        StoredSite site = editable(siteId, expectedVersion);
        SiteDocument document = sites.document(site);
        int index = conductorIndex(site, document.site(), conductorId);
        List<double[]> points = checkedPoints(input.points());
        Conductor now = document.site().conductors().get(index);
        BigDecimal heightAboveRoof = null;
        if (points.get(0).length == 2) {
            if (input.heightAboveRoof() != null && !input.heightAboveRoof().isBlank()) {
                heightAboveRoof = heightAboveSurface(input.heightAboveRoof());
            } else if (now.followsSurface()) {
                heightAboveRoof = BigDecimal.valueOf(now.heightAboveRoof());
            } else {
                throw new InvalidInputException("points", "conductor \"" + conductorId + "\" holds elevations above"
                        + " ground: give every point as [x, y, elevation], or give heightAboveRoof to make it follow"
                        + " the surface");
            }
        } else if (input.heightAboveRoof() != null && !input.heightAboveRoof().isBlank()) {
            throw new InvalidInputException("heightAboveRoof", "give either heightAboveRoof with points [x, y], or"
                    + " points [x, y, elevation above ground], not both");
        }
        checkName(input.name());
        ConductorView before = view(now, document.projection());
        PartFileEditor editor = editor(site, document);
        editor.changeConductor(index, input.name(), points, heightAboveRoof);
        store(site, editor.text());
        audit.record(siteId, "conductor-changed", "conductor " + conductorId + " path from " + describe(before.path())
                + " to " + describe(points) + (heightAboveRoof == null ? ", elevations above ground"
                : ", " + heightAboveRoof.stripTrailingZeros().toPlainString() + " m above the surface"));
        return before;
    }

    /**
     * Checks a new conductor's points and height; returns its height above the surface below, or
     * null when the points carry elevations.
     */
    private static BigDecimal checkedConductor(ConductorInput input) {
        List<double[]> points = checkedPoints(input.points());
        BigDecimal heightAboveRoof = null;
        if (points.get(0).length == 2) {
            if (input.heightAboveRoof() == null || input.heightAboveRoof().isBlank()) {
                throw new InvalidInputException("heightAboveRoof", "heightAboveRoof (metres above the surface below) is"
                        + " required when the points have no elevations");
            }
            heightAboveRoof = heightAboveSurface(input.heightAboveRoof());
        }
        checkName(input.name());
        return heightAboveRoof;
    }

    /** The points checked for count, shape and elevations; the field named is {@code points}. */
    private static List<double[]> checkedPoints(List<double[]> points) {
        if (points == null || points.size() < 2) {
            throw new InvalidInputException("points", "a conductor needs at least two points");
        }
        if (points.size() > MAX_CONDUCTOR_POINTS) {
            throw new InvalidInputException("points", "a conductor may have at most " + MAX_CONDUCTOR_POINTS + " points");
        }
        boolean elevations = points.get(0).length == 3;
        for (int k = 0; k < points.size(); k++) {
            double[] p = points.get(k);
            if (p.length != (elevations ? 3 : 2)) {
                throw new InvalidInputException("points", "point " + (k + 1) + " has " + p.length + " values; give every"
                        + " point as [x, y] or every point as [x, y, elevation above ground]");
            }
            if (elevations && p[2] < 0) {
                throw new InvalidInputException("points", "point " + (k + 1) + " lies below the ground (elevation "
                        + p[2] + " m)");
            }
            if (k > 0 && p[0] == points.get(k - 1)[0] && p[1] == points.get(k - 1)[1]) {
                throw new InvalidInputException("points", "point " + (k + 1) + " repeats point " + k
                        + " in plan; a conductor's consecutive points must differ");
            }
        }
        return points;
    }

    private static String describe(List<double[]> path) {
        StringBuilder out = new StringBuilder();
        for (double[] p : path) {
            out.append(out.isEmpty() ? "" : " ").append('(').append(round(p[0])).append(", ").append(round(p[1]));
            if (p.length > 2) {
                out.append(", ").append(round(p[2]));
            }
            out.append(')');
        }
        return out.toString();
    }

    private static String named(String name) {
        return name == null || name.isBlank() ? "" : " \"" + name.strip() + "\"";
    }

    private static int conductorIndex(StoredSite stored, Site site, String conductorId) {
        for (int i = 0; i < site.conductors().size(); i++) {
            if (site.conductors().get(i).id().equals(conductorId)) {
                return i;
            }
        }
        throw new SiteNotFoundException(stored.id(), "site " + stored.id() + " has no conductor \"" + conductorId
                + "\"");
    }

    private static ConductorView view(Conductor c, LocalProjection projection) {
        List<double[]> path = new ArrayList<>();
        List<double[]> sitePath = new ArrayList<>();
        for (Coordinate p : c.path()) {
            path.add(Double.isNaN(p.getZ()) || c.followsSurface() ? new double[] {round(p.x), round(p.y)}
                    : new double[] {round(p.x), round(p.y), round(p.getZ())});
            sitePath.add(sitePosition(projection, p.x, p.y));
        }
        return new ConductorView(c.id(), c.name(), path, sitePath, c.heightAboveRoof());
    }

    /**
     * Removes a conductor.
     *
     * @return the conductor as it was, so that it can be put back
     * @throws SiteNotFoundException when no site has this id or the site no conductor with this id
     */
    @Transactional
    public ConductorView removeConductor(long siteId, long expectedVersion, String conductorId) {
        StoredSite site = editable(siteId, expectedVersion);
        SiteDocument document = sites.document(site);
        int index = conductorIndex(site, document.site(), conductorId);
        ConductorView before = view(document.site().conductors().get(index), document.projection());
        PartFileEditor editor = editor(site, document);
        editor.removeConductor(index);
        store(site, editor.text());
        audit.record(siteId, "conductor-removed", "conductor " + conductorId + named(before.name()) + " along "
                + describe(before.path()));
        return before;
    }

    /** Most points one conductor may have. */
    public static final int MAX_CONDUCTOR_POINTS = 500;

    private static BigDecimal heightAboveSurface(String text) {
        BigDecimal value;
        try {
            value = new BigDecimal(text.strip());
        } catch (NumberFormatException e) {
            throw new InvalidInputException("heightAboveRoof", "heightAboveRoof must be a number of metres, got \""
                    + text + "\"");
        }
        if (value.signum() < 0 || value.compareTo(BigDecimal.valueOf(100)) > 0) {
            throw new InvalidInputException("heightAboveRoof", "heightAboveRoof must be between 0 and 100 m, got " + value);
        }
        return value;
    }

    private StoredSite editable(long siteId, long expectedVersion) {
        StoredSite site = sites.get(siteId);
        if (site.version() != expectedVersion) {
            throw new OptimisticLockingFailureException("site " + siteId + " is at version " + site.version()
                    + ", not " + expectedVersion);
        }
        if (!sites.isGeoJson(site)) {
            throw new InvalidInputException("file", "a WKT site file cannot hold rods (it holds flat-roofed"
                    + " structures only); upload the site as GeoJSON to place air-termination");
        }
        return site;
    }

    private void store(StoredSite site, String changed) {
        SiteFiles.read(changed, site.sourceName());
        Instant now = clock.instant().truncatedTo(ChronoUnit.MILLIS);
        rows.replaceFile(site.id(), site.version(), changed, now);
        rows.insertFileVersion(site.id(), site.sourceName(), site.sourceText(), now);
    }

    private static int rodIndex(StoredSite stored, Site site, String rodId) {
        for (int i = 0; i < site.rods().size(); i++) {
            if (site.rods().get(i).id().equals(rodId)) {
                return i;
            }
        }
        throw new SiteNotFoundException(stored.id(), "site " + stored.id() + " has no rod \"" + rodId + "\"");
    }

    private static RodView view(Rod r, LocalProjection projection) {
        return new RodView(r.id(), r.name(), round(r.x()), round(r.y()), sitePosition(projection, r.x(), r.y()),
                r.height());
    }

    private static Set<String> usedIds(Site site) {
        Set<String> used = new HashSet<>();
        site.structures().forEach(s -> used.add(s.id()));
        site.rooftopObjects().forEach(o -> used.add(o.id()));
        site.rods().forEach(r -> used.add(r.id()));
        site.conductors().forEach(c -> used.add(c.id()));
        return used;
    }

    private static BigDecimal height(String text) {
        try {
            return new BigDecimal(text.strip());
        } catch (NumberFormatException e) {
            throw new InvalidInputException("height", "height must be a number of metres, got \"" + text.strip() + "\"");
        }
    }

    private static double[] sitePosition(LocalProjection projection, double x, double y) {
        if (projection == null) {
            return new double[] {round(x), round(y)};
        }
        Coordinate lonLat = projection.toLonLat(x, y);
        return new double[] {Math.round(lonLat.x * 1e8) / 1e8, Math.round(lonLat.y * 1e8) / 1e8};
    }

    /** To the millimetre. */
    private static double round(double value) {
        return Math.round(value * 1000) / 1000.0;
    }

    /** An editor of the stored file's rods and conductors. */
    private static PartFileEditor editor(StoredSite site, SiteDocument document) {
        return new PartFileEditor(site.sourceText(), document.site().rods(), document.site().conductors(),
                document.projection());
    }

    private static void checkName(String name) {
        if (name != null && name.strip().length() > SiteService.MAX_NAME_LENGTH) {
            throw new InvalidInputException("name", "name must be at most " + SiteService.MAX_NAME_LENGTH + " characters");
        }
    }

    /** The requested id when it is free, else the first free "prefix-n". */
    private static String newId(Set<String> used, String requested, String prefix) {
        if (requested != null && !requested.isBlank()) {
            String id = requested.strip();
            if (used.contains(id)) {
                throw new InvalidInputException("id", "the id \"" + id + "\" is already used in this site");
            }
            return id;
        }
        int n = 1;
        while (used.contains(prefix + "-" + n)) {
            n++;
        }
        return prefix + "-" + n;
    }
}

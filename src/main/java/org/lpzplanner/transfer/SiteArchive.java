package org.lpzplanner.transfer;

import java.time.Instant;
import java.util.List;

/**
 * Everything stored for one site, as a site export holds it: the site and its current file, the
 * earlier files corrections replaced, every analysis revision with what it read and the items
 * accepted on it and the reviewed marks, the site's risk inputs (null until first saved), the
 * designer's edited down-conductors and marked metal installations, the saved section cuts, the keep-out areas, the comments, and the audit
 * trail. The audit trail is carried for reading only: an import does not write it back (the new
 * site's trail starts with one "import" event). Database ids are left out; numbers that users see
 * (file numbers, revisions) are kept.
 */
public record SiteArchive(Site site, List<EarlierFile> earlierFiles, List<Revision> revisions, RiskInputs riskInputs,
        List<DownConductorEdit> downConductors, List<MetalInstallation> metalInstallations, List<SavedCut> savedCuts,
        List<KeepOutArea> keepOutAreas, List<Comment> comments, List<AuditEntry> auditTrail) {

    public SiteArchive {
        downConductors = List.copyOf(downConductors);
        metalInstallations = List.copyOf(metalInstallations);
        savedCuts = List.copyOf(savedCuts);
        keepOutAreas = List.copyOf(keepOutAreas);
        comments = List.copyOf(comments);
        auditTrail = List.copyOf(auditTrail);
    }

    /**
     * The site row; {@code fileText} is the site file byte for byte (air-termination parts included);
     * {@code address} and {@code designer} are the report cover's details, empty when not entered
     * (and in files written before they were exported).
     */
    public record Site(String name, String level, Double customRadius, String fileName, String fileText,
            Instant createdAt, Instant updatedAt, long version, String address, String designer) {

        public Site {
            address = address == null ? "" : address;
            designer = designer == null ? "" : designer;
        }
    }

    public record EarlierFile(int number, String fileName, String text, Instant replacedAt) {
    }

    public record Revision(int revision, String level, double sphereRadius, double resolution, String inputsSha256,
            double exposedRoofArea, double exposedEdgeLength, int exposedCorners, int facadeBands,
            double protectedGroundArea, boolean fullyProtected, String resultGeoJson, long engineMillis,
            Instant createdAt, List<AcceptedItem> accepted, String siteName, String sourceName, String sourceText,
            Double tolerance, List<Review> reviews) {
    }

    /** A "reviewed" mark on a revision. */
    public record Review(String reviewer, Instant reviewedAt) {
    }

    /** One structure's edited down-conductor positions, [x, y] in local metres. */
    public record DownConductorEdit(String structureId, List<List<Double>> positions, Instant updatedAt) {
    }

    /** A metal installation marked for the separation distance check; material AIR or CONCRETE_OR_BRICK. */
    public record MetalInstallation(String name, double x, double y, double z, String material, Instant createdAt) {
    }

    /** A section cut saved for the site under a name; ends in local metres. */
    public record SavedCut(String name, double x1, double y1, double x2, double y2, Instant createdAt) {
    }

    /** A keep-out area stored for the site; corners [x, y] in local metres, the ring not closed. */
    public record KeepOutArea(String name, List<List<Double>> corners, Instant createdAt) {
    }

    public record Comment(String author, String body, Instant createdAt) {
    }

    /** One event of the site's audit trail, oldest first in the archive. */
    public record AuditEntry(String actor, String action, String detail, Instant createdAt) {
    }

    /**
     * The row of {@code site_risk_inputs}; choices by their names, null where not chosen yet.
     * {@code lines} holds each incoming line (null until the user said how many, or in exports written
     * before lines had their own factors: those give only {@code lineCount} and one {@code lineLength}).
     * {@code lifeCriticalSystems} is YES, NO or null.
     */
    public record RiskInputs(String flashDensitySource, Double flashDensity, Double thunderstormDays,
            String locationFactor, String surfaceType, String fireRisk, String fireProvisions, String specialHazard,
            String structureUse, String touchStep, double personsInZone, double personsTotal, double hoursPerYear,
            Integer lineCount, Double lineLength, Instant updatedAt, String lifeCriticalSystems,
            List<org.lpzplanner.risk.StoredLine> lines) {
    }

    public record AcceptedItem(String key, String reason, Instant createdAt) {
    }
}

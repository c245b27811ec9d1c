package org.lpzplanner.transfer;

import java.time.Instant;
import java.util.List;

/**
 * Everything stored for one site, as a site export holds it: the site and its current file, the
 * earlier files corrections replaced, every analysis revision with what it read and the items
 * accepted on it, and the site's risk inputs (null until first saved).
 * Database ids are left out; numbers that users see (file numbers, revisions) are kept.
 */
public record SiteArchive(Site site, List<EarlierFile> earlierFiles, List<Revision> revisions, RiskInputs riskInputs) {

    /** The site row; {@code fileText} is the site file byte for byte (air-termination parts included). */
    public record Site(String name, String level, Double customRadius, String fileName, String fileText,
            Instant createdAt, Instant updatedAt, long version) {
    }

    public record EarlierFile(int number, String fileName, String text, Instant replacedAt) {
    }

    public record Revision(int revision, String level, double sphereRadius, double resolution, String inputsSha256,
            double exposedRoofArea, double exposedEdgeLength, int exposedCorners, int facadeBands,
            double protectedGroundArea, boolean fullyProtected, String resultGeoJson, long engineMillis,
            Instant createdAt, List<AcceptedItem> accepted, String siteName, String sourceName, String sourceText,
            Double tolerance) {
    }

    /** The row of {@code site_risk_inputs}; choices by their names. */
    public record RiskInputs(String flashDensitySource, Double flashDensity, Double thunderstormDays,
            String locationFactor, String surfaceType, String fireRisk, String fireProvisions, String specialHazard,
            String structureUse, String touchStep, double personsInZone, double personsTotal, double hoursPerYear,
            Integer lineCount, Double lineLength, Instant updatedAt) {
    }

    public record AcceptedItem(String key, String reason, Instant createdAt) {
    }
}

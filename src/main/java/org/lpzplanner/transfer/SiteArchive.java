package org.lpzplanner.transfer;

import java.time.Instant;
import java.util.List;

/**
 * Everything stored for one site, as a site export holds it: the site and its current file, the
 * earlier files corrections replaced, and every analysis revision with the items accepted on it.
 * Database ids are left out; numbers that users see (file numbers, revisions) are kept.
 */
public record SiteArchive(Site site, List<EarlierFile> earlierFiles, List<Revision> revisions) {

    /** The site row; {@code fileText} is the site file byte for byte (air-termination parts included). */
    public record Site(String name, String level, Double customRadius, String fileName, String fileText,
            Instant createdAt, Instant updatedAt, long version) {
    }

    public record EarlierFile(int number, String fileName, String text, Instant replacedAt) {
    }

    public record Revision(int revision, String level, double sphereRadius, double resolution, String inputsSha256,
            double exposedRoofArea, double exposedEdgeLength, int exposedCorners, int facadeBands,
            double protectedGroundArea, boolean fullyProtected, String resultGeoJson, long engineMillis,
            Instant createdAt, List<AcceptedItem> accepted) {
    }

    public record AcceptedItem(String key, String reason, Instant createdAt) {
    }
}

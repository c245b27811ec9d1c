package org.lpzplanner.sections;

import java.time.Instant;

/** A section cut saved for a site under a name; ends in local metres. */
public record SiteCut(long id, long siteId, String name, double x1, double y1, double x2, double y2,
        Instant createdAt) {
}

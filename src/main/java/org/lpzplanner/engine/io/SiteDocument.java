package org.lpzplanner.engine.io;

import java.util.Objects;
import org.lpzplanner.engine.model.Site;

/**
 * A site read from a file, with what is needed to relate it back to the map.
 *
 * @param site       the site in local metres
 * @param projection the plane the file's lon/lat coordinates were projected onto, or null when the
 *                   file was already in local metres
 * @param sourceName the file name the site was read from, as used in messages
 */
public record SiteDocument(Site site, LocalProjection projection, String sourceName) {

    public SiteDocument {
        Objects.requireNonNull(site, "site");
        Objects.requireNonNull(sourceName, "sourceName");
    }

    /** Whether the site is tied to the map (its file was in lon/lat). */
    public boolean georeferenced() {
        return projection != null;
    }
}

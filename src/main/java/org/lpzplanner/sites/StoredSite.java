package org.lpzplanner.sites;

import java.time.Instant;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * A stored site: its name, the protection level it is assessed at, and the site file exactly as
 * it was uploaded.
 *
 * @param id           database id
 * @param name         display name chosen by the user (or taken from the file)
 * @param level        protection level the site is assessed at by default
 * @param customRadius sphere radius in metres replacing the level's own, or null
 * @param sourceName   the uploaded file's name, e.g. {@code north-yard.geojson}
 * @param sourceText   the uploaded file's content, verbatim
 * @param createdAt    when it was stored
 * @param updatedAt    when it or its analyses last changed
 * @param version      optimistic-locking counter, raised on every change
 * @param address      the site's address for the report's cover, empty when not entered
 * @param designer     the designer's name for the report's cover, empty when not entered
 */
public record StoredSite(long id, String name, ProtectionLevel level, Double customRadius, String sourceName,
        String sourceText, Instant createdAt, Instant updatedAt, long version, String address, String designer) {

    public StoredSite {
        address = address == null ? "" : address;
        designer = designer == null ? "" : designer;
    }

    /**
     * The site as {@link SiteRepository#replaceFile} stores it: the new file, changed at
     * {@code at}, one version on.
     */
    StoredSite withFile(String text, Instant at) {
        return new StoredSite(id, name, level, customRadius, sourceName, text, createdAt, at, version + 1, address,
                designer);
    }

    /** The sphere the site is assessed with by default. */
    public SphereSpec sphere() {
        return customRadius == null ? SphereSpec.of(level) : new SphereSpec(level, customRadius);
    }
}

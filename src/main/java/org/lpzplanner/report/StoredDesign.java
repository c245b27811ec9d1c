package org.lpzplanner.report;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;

/**
 * Design data a site keeps beside its revisions, as read when a report is printed: the designer's
 * edited down-conductor positions (by structure id) and the metal installations marked for the
 * separation distance check. They belong to the site, not to the revision, so the report prints
 * them with the time they were read ("as stored on … when printed"); {@link #NONE} is a report
 * without them (the command line).
 *
 * @param downConductors edited positions in local metres, by structure id
 * @param installations  marked metal installations, in the order they were marked
 * @param readAt         when they were read, or null for {@link #NONE}
 */
public record StoredDesign(Map<String, List<Coordinate>> downConductors, List<Installation> installations,
        Instant readAt) {

    public static final StoredDesign NONE = new StoredDesign(Map.of(), List.of(), null);

    private static final DateTimeFormatter DATE = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    public StoredDesign {
        downConductors = Map.copyOf(downConductors);
        installations = List.copyOf(installations);
    }

    /** A metal installation; material is the insulation between it and the LPS (AIR or CONCRETE_OR_BRICK). */
    public record Installation(String name, double x, double y, double z, String material) {
    }

    /** "as stored for the site on 2026-05-01 09:30 UTC when this report was printed". */
    public String asStored() {
        return readAt == null ? "not read (printed without the site's stored data)"
                : "as stored for the site on " + DATE.format(readAt) + " when this report was printed";
    }
}

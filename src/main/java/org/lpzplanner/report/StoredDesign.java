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
 * edited down-conductor positions (by structure id), the metal installations marked for the
 * separation distance check and the keep-out areas. They belong to the site, not to the revision, so the report prints
 * them with the time they were read ("as stored on … when printed"); {@link #NONE} is a report
 * without them (the command line).
 *
 * @param downConductors edited positions in local metres, by structure id
 * @param installations  marked metal installations, in the order they were marked
 * @param readAt         when they were read, or null for {@link #NONE}
 * @param keepOutAreas   keep-out areas stored for the site, oldest first
 */
public record StoredDesign(Map<String, List<Coordinate>> downConductors, List<Installation> installations,
        Instant readAt, List<KeepOutArea> keepOutAreas) {

    public static final StoredDesign NONE = new StoredDesign(Map.of(), List.of(), null);

    private static final DateTimeFormatter DATE = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    public StoredDesign {
        downConductors = Map.copyOf(downConductors);
        installations = List.copyOf(installations);
        keepOutAreas = List.copyOf(keepOutAreas);
    }

    /** Without keep-out areas. */
    public StoredDesign(Map<String, List<Coordinate>> downConductors, List<Installation> installations,
            Instant readAt) {
        this(downConductors, installations, readAt, List.of());
    }

    /** A keep-out area: its name and outline in local metres (ring not closed), plan area in m². */
    public record KeepOutArea(String name, List<double[]> corners, double area) {
        public KeepOutArea {
            corners = List.copyOf(corners);
        }
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

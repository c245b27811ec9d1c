package org.lpzplanner.engine.io;

import java.util.Comparator;
import java.util.List;
import org.locationtech.jts.geom.Envelope;

/**
 * Rejects sites wider than {@link SiteLimits#MAX_EXTENT} in either plan direction, which in
 * practice means a stray coordinate or wrong units. The message names the features at the two
 * extremes so the stray one can be found.
 */
final class SiteExtent {

    /** Something placed on the site and its plan bounds in local metres. */
    record Part(Place place, Envelope bounds) {}

    private SiteExtent() {}

    /**
     * @param advice what to check, appended to the message
     * @throws SiteFormatException when the parts together span more than the limit
     */
    static void check(String source, List<Part> parts, String advice) {
        if (parts.isEmpty()) {
            return;
        }
        Envelope all = new Envelope();
        parts.forEach(p -> all.expandToInclude(p.bounds()));
        String problem = null;
        if (all.getWidth() > SiteLimits.MAX_EXTENT) {
            problem = tooWide(all.getWidth(), "east-west", "westmost", "eastmost",
                    extreme(parts, Comparator.comparingDouble(p -> p.bounds().getMinX())),
                    extreme(parts, Comparator.comparingDouble((Part p) -> p.bounds().getMaxX()).reversed()));
        } else if (all.getHeight() > SiteLimits.MAX_EXTENT) {
            problem = tooWide(all.getHeight(), "north-south", "southmost", "northmost",
                    extreme(parts, Comparator.comparingDouble(p -> p.bounds().getMinY())),
                    extreme(parts, Comparator.comparingDouble((Part p) -> p.bounds().getMaxY()).reversed()));
        }
        if (problem != null) {
            throw new SiteFormatException(source, problem + "; " + advice);
        }
    }

    private static String tooWide(double span, String direction, String low, String high, Place lowPart,
            Place highPart) {
        String limit = "the site spans " + km(span) + " " + direction + "; at most " + km(SiteLimits.MAX_EXTENT)
                + " is supported. ";
        if (lowPart.equals(highPart)) {
            return limit + "The " + low + " and " + high + " points both belong to " + lowPart.label();
        }
        return limit + "The " + low + " point belongs to " + lowPart.label() + ", the " + high + " to "
                + highPart.label();
    }

    private static Place extreme(List<Part> parts, Comparator<Part> order) {
        return parts.stream().min(order).orElseThrow().place();
    }

    private static String km(double metres) {
        return Texts.number(metres / 1000, 2) + " km";
    }
}

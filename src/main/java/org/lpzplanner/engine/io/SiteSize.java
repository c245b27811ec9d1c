package org.lpzplanner.engine.io;

import java.util.Locale;

/**
 * Refuses a site file with more structures, air-termination parts or vertices than one site may
 * have ({@link SiteLimits}), before its features are checked one by one or anything is computed over
 * them, so that files, the API and the command line share the limits. The message names the count
 * and the limit.
 */
final class SiteSize {

    private SiteSize() {
    }

    /**
     * @param field the member or part of the file the counts come from ({@code "features"}), for the
     *              message
     * @throws SiteFormatException when a count is over its limit
     */
    static void check(String source, String field, long structures, long parts, long vertices) {
        if (structures > SiteLimits.MAX_STRUCTURES) {
            throw SiteFormatException.atMember(source, field, "the site has " + count(structures)
                    + " structures; at most " + count(SiteLimits.MAX_STRUCTURES) + " are accepted in one site:"
                    + " split it into several sites");
        }
        if (parts > SiteLimits.MAX_PARTS) {
            throw SiteFormatException.atMember(source, field, "the site has " + count(parts)
                    + " rods and conductors together; at most " + count(SiteLimits.MAX_PARTS)
                    + " are accepted in one site: split it into several sites, or join short conductors");
        }
        if (vertices > SiteLimits.MAX_VERTICES) {
            throw SiteFormatException.atMember(source, field, "the site's geometries have " + count(vertices)
                    + " vertices together; at most " + count(SiteLimits.MAX_VERTICES) + " are accepted in one"
                    + " site: simplify the outlines (a vertex every few centimetres adds nothing) or split the site");
        }
    }

    /** 5,001: thousands separated by commas, as the messages of the app write counts. */
    private static String count(long n) {
        return String.format(Locale.ROOT, "%,d", n);
    }
}

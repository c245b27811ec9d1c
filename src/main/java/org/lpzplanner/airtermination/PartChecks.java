package org.lpzplanner.airtermination;

import java.math.BigDecimal;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.system.InvalidInputException;

/**
 * The checks every change of the parts makes before it touches the file: names, heights, a
 * conductor's points, ids free or found. Each failure names the field the caller sent, so nothing
 * is stored and the user knows what to correct.
 */
final class PartChecks {

    /** Most points one conductor may have. */
    static final int MAX_CONDUCTOR_POINTS = Conductor.MAX_POINTS;

    private PartChecks() {
    }

    static void checkName(String name) {
        if (name != null && name.strip().length() > SiteService.MAX_NAME_LENGTH) {
            throw new InvalidInputException("name", "name must be at most " + SiteService.MAX_NAME_LENGTH + " characters");
        }
    }

    /** A rod's height as typed, in metres (the engine's reader checks its range). */
    static BigDecimal height(String text) {
        try {
            return new BigDecimal(text.strip());
        } catch (NumberFormatException e) {
            throw new InvalidInputException("height", "height must be a number of metres, got \"" + text.strip() + "\"");
        }
    }

    /** A roof conductor's height above the surface below, 0 to 100 m. */
    static BigDecimal heightAboveSurface(String text) {
        BigDecimal value;
        try {
            value = new BigDecimal(text.strip());
        } catch (NumberFormatException e) {
            throw new InvalidInputException("heightAboveRoof", "heightAboveRoof must be a number of metres, got \""
                    + text + "\"");
        }
        if (value.signum() < 0 || value.compareTo(BigDecimal.valueOf(100)) > 0) {
            throw new InvalidInputException("heightAboveRoof", "heightAboveRoof must be between 0 and 100 m, got " + value);
        }
        return value;
    }

    /**
     * Checks a new conductor's points, height and name; returns its height above the surface below,
     * or null when the points carry elevations.
     */
    static BigDecimal checkedConductor(ConductorInput input) {
        List<double[]> points = checkedPoints(input.points());
        BigDecimal heightAboveRoof = null;
        if (points.get(0).length == 2) {
            if (input.heightAboveRoof() == null || input.heightAboveRoof().isBlank()) {
                throw new InvalidInputException("heightAboveRoof", "heightAboveRoof (metres above the surface below) is"
                        + " required when the points have no elevations");
            }
            heightAboveRoof = heightAboveSurface(input.heightAboveRoof());
        }
        checkName(input.name());
        return heightAboveRoof;
    }

    /** The points checked for count, shape and elevations; the field named is {@code points}. */
    static List<double[]> checkedPoints(List<double[]> points) {
        if (points == null || points.size() < 2) {
            throw new InvalidInputException("points", "a conductor needs at least two points");
        }
        if (points.size() > MAX_CONDUCTOR_POINTS) {
            throw new InvalidInputException("points", "a conductor may have at most " + MAX_CONDUCTOR_POINTS + " points");
        }
        boolean elevations = points.get(0).length == 3;
        for (int k = 0; k < points.size(); k++) {
            double[] p = points.get(k);
            if (p.length != (elevations ? 3 : 2)) {
                throw new InvalidInputException("points", "point " + (k + 1) + " has " + p.length + " values; give every"
                        + " point as [x, y] or every point as [x, y, elevation above ground]");
            }
            if (elevations && p[2] < 0) {
                throw new InvalidInputException("points", "point " + (k + 1) + " lies below the ground (elevation "
                        + p[2] + " m)");
            }
            if (k > 0 && p[0] == points.get(k - 1)[0] && p[1] == points.get(k - 1)[1]) {
                throw new InvalidInputException("points", "point " + (k + 1) + " repeats point " + k
                        + " in plan; a conductor's consecutive points must differ");
            }
        }
        return points;
    }

    /** Every id the site's features use: structures, rooftop objects, rods and conductors share one set. */
    static Set<String> usedIds(Site site) {
        Set<String> used = new HashSet<>();
        site.structures().forEach(s -> used.add(s.id()));
        site.rooftopObjects().forEach(o -> used.add(o.id()));
        site.rods().forEach(r -> used.add(r.id()));
        site.conductors().forEach(c -> used.add(c.id()));
        return used;
    }

    /** The requested id when it is free, else the first free "prefix-n". */
    static String newId(Set<String> used, String requested, String prefix) {
        if (requested != null && !requested.isBlank()) {
            String id = requested.strip();
            if (used.contains(id)) {
                throw new InvalidInputException("id", "the id \"" + id + "\" is already used in this site");
            }
            return id;
        }
        int n = 1;
        while (used.contains(prefix + "-" + n)) {
            n++;
        }
        return prefix + "-" + n;
    }

    /** @throws SiteNotFoundException when the site holds no rod with this id */
    static int rodIndex(StoredSite stored, Site site, String rodId) {
        for (int i = 0; i < site.rods().size(); i++) {
            if (site.rods().get(i).id().equals(rodId)) {
                return i;
            }
        }
        throw new SiteNotFoundException(stored.id(), "site " + stored.id() + " has no rod \"" + rodId + "\"");
    }

    /** @throws SiteNotFoundException when the site holds no conductor with this id */
    static int conductorIndex(StoredSite stored, Site site, String conductorId) {
        for (int i = 0; i < site.conductors().size(); i++) {
            if (site.conductors().get(i).id().equals(conductorId)) {
                return i;
            }
        }
        throw new SiteNotFoundException(stored.id(), "site " + stored.id() + " has no conductor \"" + conductorId
                + "\"");
    }
}

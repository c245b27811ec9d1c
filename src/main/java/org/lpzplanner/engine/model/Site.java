package org.lpzplanner.engine.model;

import java.util.List;

/**
 * A site in local metres (x east, y north, z up from flat ground at 0): structures, rooftop objects
 * and the air-termination parts placed on them.
 */
public record Site(String name, List<Structure> structures, List<RooftopObject> rooftopObjects, List<Rod> rods,
        List<Conductor> conductors) {

    public Site {
        structures = List.copyOf(structures);
        rooftopObjects = List.copyOf(rooftopObjects);
        rods = List.copyOf(rods);
        conductors = List.copyOf(conductors);
    }

    /** The same site with a different set of air-termination parts. */
    public Site withAirTermination(List<Rod> newRods, List<Conductor> newConductors) {
        return new Site(name, structures, rooftopObjects, newRods, newConductors);
    }
}

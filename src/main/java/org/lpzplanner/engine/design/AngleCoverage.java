package org.lpzplanner.engine.design;

import java.util.List;
import org.locationtech.jts.geom.Coordinate;

/**
 * How far the rods of a site cover one structure's roof by the protective angle method.
 *
 * @param structureId     the structure checked
 * @param structureName   its name (the id when it has none)
 * @param sampledPoints   roof points tested: grid points, face corners and points along roof edges,
 *                        parapets, ridges and hips
 * @param uncoveredPoints the tested points (x, y, z above ground) no rod's cone contains
 * @param uncoveredArea   approximate plan area of roof left uncovered, m²: uncovered grid points
 *                        times the grid cell area; off by up to about the roof perimeter times the
 *                        grid spacing
 * @param notes           rods left out of the check and why, in plain words
 */
public record AngleCoverage(String structureId, String structureName, int sampledPoints,
        List<Coordinate> uncoveredPoints, double uncoveredArea, List<String> notes) {

    public AngleCoverage {
        uncoveredPoints = List.copyOf(uncoveredPoints);
        notes = List.copyOf(notes);
    }

    /** True when every tested roof point lies inside the cone of some rod. */
    public boolean isCovered() {
        return uncoveredPoints.isEmpty();
    }
}

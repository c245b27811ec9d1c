package org.lpzplanner.engine.design;

import java.util.List;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;

/**
 * Mesh method result for one roof face.
 *
 * @param ownerId            the structure the face belongs to
 * @param faceLabel          the face's label, e.g. "North hall roof 1"
 * @param faceIndex          the face's index in the site surface
 * @param status             pass, fail, or not applicable (slope steeper than the mesh method allows here)
 * @param largestCell        larger side of the largest cell's minimum-width rectangle, metres (0 when no cell)
 * @param cells              the cells the roof conductors divide the face into, clipped to the face
 * @param cellsTooLarge      the cells whose larger side exceeds the mesh size
 * @param openArea           the part of the face no conductor loop encloses (empty when none)
 * @param edgesWithoutConductor the parts of the face's edges with no conductor within the edge reach
 * @param reason             a sentence saying why the face failed or was not checked; empty on pass
 */
public record MeshFaceResult(String ownerId, String faceLabel, int faceIndex, Status status, double largestCell,
        List<Polygon> cells, List<Polygon> cellsTooLarge, Geometry openArea, Geometry edgesWithoutConductor,
        String reason) {

    /** Outcome of the check of one face. */
    public enum Status { PASS, FAIL, NOT_APPLICABLE }

    public MeshFaceResult {
        cells = List.copyOf(cells);
        cellsTooLarge = List.copyOf(cellsTooLarge);
    }

    public boolean passes() {
        return status == Status.PASS;
    }
}

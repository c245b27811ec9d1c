package org.lpzplanner.engine.exposure;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;

/**
 * One analysis with everything needed to redo it after an edit of the air-termination: the site,
 * the envelope, and every decision per edge, corner, wall and roof cell. Pass it to
 * {@link ExposureAnalysis#update} with the edited site. Immutable once built; safe to share
 * between threads. Holds the envelope grid, so keep only a few of them.
 */
public final class AnalysisState {

    final Site site;
    final AnalysisOptions options;
    final SiteSurface surface;
    final EnvelopeField field;
    final AnalysisResult result;
    final List<List<EdgeExposure>> edgesByEdge;
    final Map<String, Set<Integer>> exposedEdgeCells;
    final List<SiteSurface.Corner> corners;
    final CornerExposure[] cornerByIndex;
    final List<List<FacadeBand>> bandsByWall;
    final RoofExposureOp.FaceCells[] faceCells;
    final RoofExposure[] roofs;
    final ProtectedGroundOp.GroundCells ground;

    AnalysisState(Site site, AnalysisOptions options, SiteSurface surface, EnvelopeField field, AnalysisResult result,
            List<List<EdgeExposure>> edgesByEdge, Map<String, Set<Integer>> exposedEdgeCells,
            List<SiteSurface.Corner> corners, CornerExposure[] cornerByIndex, List<List<FacadeBand>> bandsByWall,
            RoofExposureOp.FaceCells[] faceCells, RoofExposure[] roofs, ProtectedGroundOp.GroundCells ground) {
        this.site = site;
        this.options = options;
        this.surface = surface;
        this.field = field;
        this.result = result;
        this.edgesByEdge = edgesByEdge;
        this.exposedEdgeCells = exposedEdgeCells;
        this.corners = corners;
        this.cornerByIndex = cornerByIndex;
        this.bandsByWall = bandsByWall;
        this.faceCells = faceCells;
        this.roofs = roofs;
        this.ground = ground;
    }

    public AnalysisResult result() {
        return result;
    }

    public Site site() {
        return site;
    }

    public AnalysisOptions options() {
        return options;
    }

    /** Grid cells of the envelope it holds: its memory grows with them (roughly 100 bytes a cell). */
    public long gridCells() {
        return (long) field.grid().nx() * field.grid().ny();
    }

    /**
     * The plan box [minX, minY, maxX, maxY] of the air-termination parts that differ between this
     * state's site and {@code next}: an empty box (min above max) when none differ, null when
     * anything else differs (structures, rooftop objects), which needs a whole new analysis.
     */
    double[] changedPartsBox(Site next) {
        if (!site.structures().equals(next.structures()) || !site.rooftopObjects().equals(next.rooftopObjects())) {
            return null;
        }
        double[] box = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
            Double.NEGATIVE_INFINITY};
        Set<Rod> oldRods = new HashSet<>(site.rods()), newRods = new HashSet<>(next.rods());
        for (Rod r : site.rods()) {
            if (!newRods.contains(r)) {
                include(box, r.x(), r.y());
            }
        }
        for (Rod r : next.rods()) {
            if (!oldRods.contains(r)) {
                include(box, r.x(), r.y());
            }
        }
        Set<List<Object>> oldConductors = keys(site.conductors()), newConductors = keys(next.conductors());
        for (Conductor c : site.conductors()) {
            if (!newConductors.contains(key(c))) {
                c.path().forEach(p -> include(box, p.x, p.y));
            }
        }
        for (Conductor c : next.conductors()) {
            if (!oldConductors.contains(key(c))) {
                c.path().forEach(p -> include(box, p.x, p.y));
            }
        }
        return box;
    }

    private static Set<List<Object>> keys(List<Conductor> conductors) {
        Set<List<Object>> out = new HashSet<>();
        conductors.forEach(c -> out.add(key(c)));
        return out;
    }

    /** A conductor's values with its vertices' heights (JTS coordinates compare in plan only). */
    private static List<Object> key(Conductor c) {
        List<Object> out = new java.util.ArrayList<>(List.of(c.id(), c.name(), String.valueOf(c.heightAboveRoof())));
        c.path().forEach(p -> out.addAll(List.of(p.x, p.y, p.getZ())));
        return out;
    }

    private static void include(double[] box, double x, double y) {
        box[0] = Math.min(box[0], x);
        box[1] = Math.min(box[1], y);
        box[2] = Math.max(box[2], x);
        box[3] = Math.max(box[3], y);
    }

    static boolean isEmpty(double[] box) {
        return box[0] > box[2];
    }

}

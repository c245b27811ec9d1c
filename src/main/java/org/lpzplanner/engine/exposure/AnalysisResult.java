package org.lpzplanner.engine.exposure;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * Everything one rolling-sphere analysis found. All lengths and heights in metres, areas in m²
 * (plan), times in milliseconds.
 *
 * @param resolution grid spacing used
 * @param tolerance  exact envelope queries are at most this far below the true envelope, never above
 * @param refinedQueries how many decisions needed the exact (branch and bound) evaluation
 * @param stageMillis    time per stage (envelope, roofs, edges, corners, facades, parts, ground)
 * @param warnings       what the designer must know before relying on the result (e.g. a wire more
 *                       than R above the surface beneath it); no verdict of full protection while any stands
 */
public record AnalysisResult(SphereSpec sphere, double resolution, double tolerance, List<RoofExposure> roofs,
        List<EdgeExposure> edges, List<CornerExposure> corners, List<FacadeBand> facades,
        List<PartInterception> parts, ProtectedGround protectedGround, EnvelopeField envelope, long envelopeMillis,
        long totalMillis, long refinedQueries, Map<String, Long> stageMillis, List<ModelWarning> warnings) {

    public AnalysisResult {
        stageMillis = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(stageMillis));
        warnings = List.copyOf(warnings);
    }

    /** Exposed roof plan area per owner (structure or rooftop object) name, in input order. */
    public Map<String, Double> exposedRoofAreaByOwner() {
        Map<String, Double> out = new LinkedHashMap<>();
        for (RoofExposure r : roofs) {
            out.merge(r.ownerName(), r.exposedPlanArea(), Double::sum);
        }
        return out;
    }

    public double totalExposedRoofArea() {
        return roofs.stream().mapToDouble(RoofExposure::exposedPlanArea).sum();
    }

    public double totalExposedEdgeLength() {
        return edges.stream().mapToDouble(EdgeExposure::length).sum();
    }

    /** True when no roof, edge, corner or facade band is exposed and no warning stands. */
    public boolean isFullyProtected() {
        return warnings.isEmpty() && totalExposedRoofArea() == 0 && edges.isEmpty() && corners.isEmpty()
                && facades.isEmpty();
    }
}

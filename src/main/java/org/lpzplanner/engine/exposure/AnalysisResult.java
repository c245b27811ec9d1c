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
 * @param facades        every facade band a sphere reaches from the side, as the geometry gives them
 * @param warnings       what the designer must know before relying on the result (e.g. a wire more
 *                       than R above the surface beneath it); no verdict of full protection while any stands
 * @param facadeParts    the facade bands classified by the tall-structure rule ({@link SideFlashRule},
 *                       IEC 62305-3:2010 5.2.3): only parts that need lateral air-termination are exposure
 */
public record AnalysisResult(SphereSpec sphere, double resolution, double tolerance, List<RoofExposure> roofs,
        List<EdgeExposure> edges, List<CornerExposure> corners, List<FacadeBand> facades,
        List<PartInterception> parts, ProtectedGround protectedGround, EnvelopeField envelope, long envelopeMillis,
        long totalMillis, long refinedQueries, Map<String, Long> stageMillis, List<ModelWarning> warnings,
        List<SideFlashRule.Part> facadeParts) {

    public AnalysisResult {
        stageMillis = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(stageMillis));
        warnings = List.copyOf(warnings);
        facadeParts = List.copyOf(facadeParts);
    }

    /** The parts of facade bands that need lateral air-termination (IEC 62305-3:2010 5.2.3). */
    public List<SideFlashRule.Part> facadePartsNeedingLateral() {
        return facadeParts.stream().filter(SideFlashRule.Part::needsLateralAirTermination).toList();
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

    /**
     * True when no roof, edge or corner is exposed, no part of a facade band needs lateral
     * air-termination (bands where flashes to the side are negligible, IEC 62305-3:2010 5.2.3 and
     * Annex A, do not count) and no warning stands.
     */
    public boolean isFullyProtected() {
        return warnings.isEmpty() && totalExposedRoofArea() == 0 && edges.isEmpty() && corners.isEmpty()
                && facadeParts.stream().noneMatch(SideFlashRule.Part::needsLateralAirTermination);
    }
}

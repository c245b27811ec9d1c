package org.lpzplanner.engine.design.proposal;

import java.util.List;
import java.util.Map;
import org.lpzplanner.engine.exposure.AnalysisResult;

/**
 * A proposed air-termination and what the full analysis found with it.
 *
 * @param parts              the proposed parts (the site's own parts are kept besides them)
 * @param complete           true only when the full analysis of the site with the parts finds no
 *                           exposed roof, edge, corner or facade band except accepted ones
 * @param verification       that analysis
 * @param left               what is still exposed and not accepted, by kind ("roof", "edge",
 *                           "corner", "facade"): number of sampled points (roof points {@value ExposedPoints#ROOF_SPACING} m,
 *                           line points {@value ExposedPoints#LINE_SPACING} m apart)
 * @param beyondReach        sampled exposed points no candidate part can cover at all (e.g. facades
 *                           higher than the sphere radius), so no proposal of these parts can cover them
 * @param regularLayoutCount parts of the plain regular layout at the level's mesh size ({@link RegularLayout})
 * @param rounds             choose-and-verify rounds run
 * @param candidates         candidate parts considered
 * @param elapsedMillis      wall-clock time of the whole proposal
 */
public record Proposal(List<ProposedPart> parts, boolean complete, AnalysisResult verification,
        Map<String, Integer> left, int beyondReach, int regularLayoutCount, int rounds, int candidates,
        long elapsedMillis) {

    public Proposal {
        parts = List.copyOf(parts);
        left = Map.copyOf(left);
    }

    /** Number of proposed parts (rods, masts and conductor runs). */
    public int count() {
        return parts.size();
    }

    /** Proposed parts as a share of the regular layout's, e.g. 0.55; NaN when that has none. */
    public double shareOfRegular() {
        return regularLayoutCount == 0 ? Double.NaN : (double) parts.size() / regularLayoutCount;
    }
}

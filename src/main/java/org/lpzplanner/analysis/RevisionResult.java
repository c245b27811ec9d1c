package org.lpzplanner.analysis;

import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.io.SiteDocument;

/**
 * What a revision stores of one analysis: the totals, the verdict and the result GeoJSON, derived
 * in one place so that an analysis run here and a revision analysed again on import store the same
 * columns the same way. Areas are plan areas in m², lengths in metres.
 *
 * @param resolution    grid spacing the engine used, metres
 * @param tolerance     tolerance of exact envelope values, metres
 * @param facadeBands   facade bands (or parts of them) that need lateral air-termination
 *                      (IEC 62305-3:2010 5.2.3); bands where flashes to the side are negligible are not counted
 * @param fullyProtected no roof area, edge, corner or facade band needing lateral air-termination is
 *                      exposed and no model warning stands
 * @param resultGeoJson the stored form of the result (see {@link ResultGeoJson#write(SiteDocument, AnalysisResult)})
 * @param engineMillis  time the engine took
 */
public record RevisionResult(double resolution, double tolerance, double exposedRoofArea, double exposedEdgeLength,
        int exposedCorners, int facadeBands, double protectedGroundArea, boolean fullyProtected, String resultGeoJson,
        long engineMillis) {

    public static RevisionResult of(SiteDocument document, AnalysisResult result) {
        return new RevisionResult(result.resolution(), result.tolerance(), result.totalExposedRoofArea(),
                result.totalExposedEdgeLength(), result.corners().size(), result.facadePartsNeedingLateral().size(),
                result.protectedGround().planArea(), result.isFullyProtected(), ResultGeoJson.write(document, result),
                result.totalMillis());
    }
}

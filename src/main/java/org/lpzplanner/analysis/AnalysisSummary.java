package org.lpzplanner.analysis;

import java.time.Instant;

/**
 * The numbers of one analysis revision as the API shows them. Areas are plan areas in m², lengths
 * in metres, rounded to the centimetre. {@code facadeBands} counts the bands (or their parts) that
 * need lateral air-termination, {@code negligibleFacadeBands} those where flashes to the side are
 * negligible (IEC 62305-3:2010 5.2.3; null when the revision was read without its result).
 */
public record AnalysisSummary(int revision, String method, String level, double radius, double resolution,
        double exposedRoofArea, double exposedEdgeLength, int exposedCorners, int facadeBands,
        Integer negligibleFacadeBands, double protectedGroundArea, boolean fullyProtected, String inputsSha256,
        long engineMillis, Instant analysedAt) {

    public static AnalysisSummary of(AnalysisRevision r) {
        return of(r, r.resultGeoJson() == null ? null : ReviewItems.negligibleBands(r.resultGeoJson()));
    }

    /** As {@link #of(AnalysisRevision)}, with the count of negligible facade bands already known. */
    static AnalysisSummary of(AnalysisRevision r, Integer negligibleFacadeBands) {
        return new AnalysisSummary(r.revision(), ResultGeoJson.METHOD, r.level().name(), ResultGeoJson.round(r.sphereRadius()),
                ResultGeoJson.round(r.resolution()), ResultGeoJson.round(r.exposedRoofArea()),
                ResultGeoJson.round(r.exposedEdgeLength()), r.exposedCorners(), r.facadeBands(),
                negligibleFacadeBands, ResultGeoJson.round(r.protectedGroundArea()), r.fullyProtected(), r.inputsSha256(), r.engineMillis(),
                r.createdAt());
    }
}

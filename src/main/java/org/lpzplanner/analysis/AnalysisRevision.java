package org.lpzplanner.analysis;

import java.time.Instant;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * One stored analysis run of a site. Areas are plan areas in m², lengths in metres.
 *
 * @param revision          1 for a site's first analysis, then counting up
 * @param sphereRadius      radius actually rolled, metres
 * @param resolution        grid spacing the engine used, metres
 * @param inputsSha256      SHA-256 (hex) of the site file text the analysis read
 * @param exposedCorners    number of exposed corners
 * @param facadeBands       number of facade bands (or their parts) a sphere reaches from the side that
 *                          need lateral air-termination (IEC 62305-3:2010 5.2.3); revisions stored
 *                          before bands were classified counted every band
 * @param fullyProtected    no roof area, edge or corner is exposed, no facade band needs lateral
 *                          air-termination and no model warning stands (the engine's verdict)
 * @param resultGeoJson     the result drawing data (see {@link ResultGeoJson}); null when a query
 *                          left it out
 * @param engineMillis      time the engine took
 */
public record AnalysisRevision(long id, long siteId, int revision, ProtectionLevel level, double sphereRadius,
        double resolution, String inputsSha256, double exposedRoofArea, double exposedEdgeLength, int exposedCorners,
        int facadeBands, double protectedGroundArea, boolean fullyProtected, String resultGeoJson,
        Instant createdAt, long engineMillis) {
}

package org.lpzplanner.analysis;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.EdgeExposure;
import org.lpzplanner.engine.exposure.PartInterception;
import org.lpzplanner.engine.exposure.RoofExposure;
import org.lpzplanner.engine.exposure.SideFlashRule;
import org.lpzplanner.engine.geom.EdgeKind;
import org.lpzplanner.engine.geom.SurfaceKind;

/**
 * The totals of one analysis, computed once so that the command line's printed summary and the
 * result GeoJSON ({@link ResultGeoJson}) always agree. Areas are plan areas in m², lengths in metres.
 *
 * @param roofs          roof totals per owner (structure or rooftop object), in the engine's order
 * @param edgeLengths    exposed edge length per kind, only kinds with some exposure, in enum order
 * @param corners        exposed corners
 * @param facadeBands    facade bands (or their upper parts) that need lateral air-termination
 *                       (IEC 62305-3:2010 5.2.3)
 * @param facadeLength   total length along the walls of those
 * @param parts          air-termination parts in the site
 * @param interceptingParts parts a sphere can touch
 * @param protectedGround protected open ground
 * @param negligibleBands facade bands (or their lower parts) where flashes to the side are negligible
 * @param negligibleLength total length along the walls of those
 * @param warnings       model warnings
 */
public record ResultTotals(List<OwnerRoof> roofs, Map<EdgeKind, Double> edgeLengths, int corners, int facadeBands,
        double facadeLength, int parts, int interceptingParts, double protectedGround, int negligibleBands,
        double negligibleLength, int warnings) {

    public ResultTotals {
        roofs = List.copyOf(roofs);
        Map<EdgeKind, Double> ordered = new EnumMap<>(EdgeKind.class); // enum order whatever map is given
        ordered.putAll(edgeLengths);
        edgeLengths = Collections.unmodifiableMap(ordered);
    }

    /**
     * Roof of one owner: all its faces together.
     *
     * @param roofArea    plan area of all its faces
     * @param exposedArea plan area of their exposed parts
     */
    public record OwnerRoof(String ownerId, String ownerName, SurfaceKind kind, double roofArea, double exposedArea) {

        /** Exposed share in percent, 0 for an owner without roof area. */
        public double exposedPercent() {
            return roofArea > 0 ? 100 * exposedArea / roofArea : 0;
        }
    }

    public static ResultTotals of(AnalysisResult result) {
        Map<String, OwnerRoof> owners = new LinkedHashMap<>();
        for (RoofExposure r : result.roofs()) {
            // Keyed by kind and id: a structure and a rooftop object may share an id.
            owners.merge(r.kind() + "|" + r.ownerId(),
                    new OwnerRoof(r.ownerId(), r.ownerName(), r.kind(), r.planArea(), r.exposedPlanArea()),
                    (a, b) -> new OwnerRoof(a.ownerId(), a.ownerName(), a.kind(), a.roofArea() + b.roofArea(),
                            a.exposedArea() + b.exposedArea()));
        }
        Map<EdgeKind, Double> edges = new EnumMap<>(EdgeKind.class);
        for (EdgeExposure e : result.edges()) {
            edges.merge(e.kind(), e.length(), Double::sum);
        }
        List<SideFlashRule.Part> needing = result.facadePartsNeedingLateral();
        List<SideFlashRule.Part> negligible = result.facadeParts().stream().filter(p -> !p.needsLateralAirTermination())
                .toList();
        int intercepting = (int) result.parts().stream().filter(PartInterception::intercepts).count();
        return new ResultTotals(new ArrayList<>(owners.values()), edges, result.corners().size(),
                needing.size(), length(needing), result.parts().size(), intercepting,
                result.protectedGround().planArea(), negligible.size(), length(negligible), result.warnings().size());
    }

    private static double length(List<SideFlashRule.Part> parts) {
        return parts.stream().mapToDouble(p -> p.band().length()).sum();
    }

    public double roofArea() {
        return roofs.stream().mapToDouble(OwnerRoof::roofArea).sum();
    }

    public double exposedRoofArea() {
        return roofs.stream().mapToDouble(OwnerRoof::exposedArea).sum();
    }

    /**
     * True when some roof area, edge or corner is exposed or some facade band needs lateral
     * air-termination (model warnings aside).
     */
    public boolean anyExposed() {
        return exposedRoofArea() > 0 || !edgeLengths.isEmpty() || corners > 0 || facadeBands > 0;
    }

    public double edgeLength() {
        return edgeLengths.values().stream().mapToDouble(Double::doubleValue).sum();
    }

    /** A kind's name as written in files, e.g. "roof-edge" or "rooftop-object-edge". */
    public static String edgeKindName(EdgeKind kind) {
        return kind.label().replace(' ', '-');
    }
}

package org.lpzplanner.design;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.lpzplanner.engine.design.proposal.Proposal;
import org.lpzplanner.engine.design.proposal.ProposedPart;
import org.lpzplanner.engine.exposure.AnalysisResult;

/**
 * A finished proposal as stored with its job and shown by the API: its parts (rods and masts with
 * position and height, conductors with their path and elevations) and its figures. Accepting reads
 * the parts back from this, so any app instance can accept a proposal another one computed.
 */
final class ProposalResultJson {

    private ProposalResultJson() {
    }

    static Map<String, Object> of(Proposal p) {
        Map<String, Object> out = new LinkedHashMap<>();
        List<Map<String, Object>> parts = new ArrayList<>();
        for (ProposedPart part : p.parts()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("kind", part.kind().name().toLowerCase(Locale.ROOT));
            m.put("place", part.place().name().toLowerCase(Locale.ROOT));
            m.put("structure", part.ownerId());
            if (part.rod() != null) {
                m.put("name", part.rod().name());
                m.put("x", part.rod().x());
                m.put("y", part.rod().y());
                m.put("height", part.rod().height());
            } else {
                m.put("name", part.conductor().name());
                List<double[]> path = new ArrayList<>();
                part.conductor().path().forEach(c -> path.add(new double[] {c.x, c.y, c.getZ()}));
                m.put("path", path);
                m.put("length", Math.round(part.conductorLength() * 100) / 100.0);
            }
            parts.add(m);
        }
        out.put("parts", parts);
        out.put("count", p.count());
        out.put("counts", DesignService.partCounts(p.parts()));
        out.put("regularLayoutCount", p.regularLayoutCount());
        out.put("shareOfRegular", Double.isNaN(p.shareOfRegular()) ? null : Math.round(p.shareOfRegular() * 1000) / 1000.0);
        out.put("complete", p.complete());
        out.put("left", p.left());
        out.put("beyondReach", p.beyondReach());
        out.put("rounds", p.rounds());
        out.put("elapsedMillis", p.elapsedMillis());
        out.put("verification", verification(p.verification()));
        return out;
    }

    /** What the proposal's last full analysis found (the one that decided {@code complete}). */
    private static Map<String, Object> verification(AnalysisResult r) {
        Map<String, Object> out = new LinkedHashMap<>();
        if (r == null) {
            return out;
        }
        out.put("resolution", r.resolution());
        out.put("fullyProtected", r.isFullyProtected());
        out.put("exposedEdges", r.edges().size());
        out.put("exposedCorners", r.corners().size());
        out.put("exposedFacadeBands", r.facadePartsNeedingLateral().size());
        out.put("exposedRoofArea", r.totalExposedRoofArea());
        out.put("exposedEdgeLength", r.totalExposedEdgeLength());
        return out;
    }
}

package org.lpzplanner.design;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.lpzplanner.engine.design.proposal.Proposal;
import org.lpzplanner.engine.design.proposal.ProposedPart;
import org.lpzplanner.engine.design.quantities.BillOfQuantities;
import org.lpzplanner.engine.exposure.AnalysisResult;

/**
 * A finished proposal as stored with its job (JSON, {@code background_jobs.outcome_json}) and shown
 * by the API: its parts (rods and masts with position and height, conductors with their path and
 * elevations, local metres) and its figures. Accepting reads the parts back from this, so any app
 * instance can accept a proposal another one computed; unknown members of results stored by other
 * releases are ignored.
 *
 * @param counts         the parts by kind and height, e.g. {@code {"rod 1 m": 4}}
 * @param shareOfRegular the parts as a share of the regular layout's, null when that has none
 */
@JsonIgnoreProperties(ignoreUnknown = true)
public record StoredProposal(List<Part> parts, int count, Map<String, Integer> counts, int regularLayoutCount,
        Double shareOfRegular, boolean complete, Map<String, Integer> left, int beyondReach, int rounds,
        long elapsedMillis, Verification verification) {

    /**
     * One proposed part: a rod or mast ({@code x}, {@code y}, {@code height}) or a conductor
     * ({@code path} of [x, y, elevation above ground], {@code length} in metres).
     *
     * @param kind  {@code rod}, {@code mast}, {@code edge_conductor} or {@code ridge_conductor}
     * @param place where it stands ({@link ProposedPart.Place}, lower case)
     */
    @JsonIgnoreProperties(ignoreUnknown = true)
    public record Part(String kind, String place, String structure, String name,
            @JsonInclude(JsonInclude.Include.NON_NULL) Double x, @JsonInclude(JsonInclude.Include.NON_NULL) Double y,
            @JsonInclude(JsonInclude.Include.NON_NULL) Double height,
            @JsonInclude(JsonInclude.Include.NON_NULL) List<double[]> path,
            @JsonInclude(JsonInclude.Include.NON_NULL) Double length) {

        boolean isRod() {
            return x != null;
        }

        boolean isMast() {
            return "mast".equals(kind);
        }
    }

    /** What the proposal's last full analysis found (the one that decided {@code complete}); empty when none ran. */
    @JsonIgnoreProperties(ignoreUnknown = true)
    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record Verification(Double resolution, Boolean fullyProtected, Integer exposedEdges, Integer exposedCorners,
            Integer exposedFacadeBands, Double exposedRoofArea, Double exposedEdgeLength) {

        static Verification of(AnalysisResult r) {
            if (r == null) {
                return new Verification(null, null, null, null, null, null, null);
            }
            return new Verification(r.resolution(), r.isFullyProtected(), r.edges().size(), r.corners().size(),
                    r.facadePartsNeedingLateral().size(), r.totalExposedRoofArea(), r.totalExposedEdgeLength());
        }
    }

    static StoredProposal of(Proposal p) {
        List<Part> parts = new ArrayList<>();
        for (ProposedPart part : p.parts()) {
            String kind = part.kind().name().toLowerCase(Locale.ROOT);
            String place = part.place().name().toLowerCase(Locale.ROOT);
            if (part.rod() != null) {
                parts.add(new Part(kind, place, part.ownerId(), part.rod().name(), part.rod().x(), part.rod().y(),
                        part.rod().height(), null, null));
            } else {
                List<double[]> path = new ArrayList<>();
                part.conductor().path().forEach(c -> path.add(new double[] {c.x, c.y, c.getZ()}));
                parts.add(new Part(kind, place, part.ownerId(), part.conductor().name(), null, null, null, path,
                        Math.round(part.conductorLength() * 100) / 100.0));
            }
        }
        return new StoredProposal(parts, p.count(), partCounts(p.parts()), p.regularLayoutCount(),
                Double.isNaN(p.shareOfRegular()) ? null : Math.round(p.shareOfRegular() * 1000) / 1000.0, p.complete(),
                p.left(), p.beyondReach(), p.rounds(), p.elapsedMillis(), Verification.of(p.verification()));
    }

    /** Counts of the parts of a proposal by kind and height, e.g. {"rod 1 m": 4}. */
    static Map<String, Integer> partCounts(List<ProposedPart> parts) {
        Map<String, Integer> out = new LinkedHashMap<>();
        for (ProposedPart p : parts) {
            String key = p.rod() != null ? (p.kind() == ProposedPart.Kind.MAST ? "mast " : "rod ")
                    + BillOfQuantities.metresText(p.rod().height()) + " m"
                    : p.kind() == ProposedPart.Kind.RIDGE_CONDUCTOR ? "ridge conductor" : "roof-edge conductor";
            out.merge(key, 1, Integer::sum);
        }
        return out;
    }
}

package org.lpzplanner.engine.design.proposal;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.CornerExposure;
import org.lpzplanner.engine.exposure.EdgeExposure;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.exposure.FacadeBand;
import org.lpzplanner.engine.exposure.RoofExposure;
import org.lpzplanner.engine.geom.Areas;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;

/** Independent checks of a proposal: a fresh full analysis of the site with the proposed parts. */
final class ProposalChecks {

    private static final GeometryFactory GF = new GeometryFactory();

    private ProposalChecks() {
    }

    /**
     * Runs the full analysis again on the site with the parts and asserts that everything it finds
     * exposed lies within the accepted reach of an accepted geometry.
     */
    static AnalysisResult assertFullyCovered(Site site, Proposal proposal, SphereSpec sphere, List<Geometry> accepted) {
        assertThat(proposal.complete()).as("proposal says complete; left: %s", proposal.left()).isTrue();
        AnalysisResult fresh = ExposureAnalysis.analyze(AirTerminationProposer.withParts(site, proposal.parts()),
                AnalysisOptions.of(sphere));
        Geometry allowed = accepted.isEmpty() ? GF.createPolygon()
                : GF.buildGeometry(accepted).buffer(ProposalOptions.ACCEPTED_REACH + 0.01);
        List<String> left = new ArrayList<>();
        for (EdgeExposure e : fresh.edges()) {
            if (!allowed.covers(flat(e.line()))) {
                left.add("edge " + e.ownerId() + " " + e.line());
            }
        }
        for (CornerExposure c : fresh.corners()) {
            if (!allowed.covers(GF.createPoint(new Coordinate(c.point().x, c.point().y)))) {
                left.add("corner " + c.ownerId() + " " + c.point());
            }
        }
        for (FacadeBand b : fresh.facades()) {
            if (!allowed.covers(flat(b.line()))) {
                left.add("facade " + b.ownerId() + " " + b.line());
            }
        }
        double cell = fresh.resolution();
        for (RoofExposure r : fresh.roofs()) {
            if (!r.isExposed()) {
                continue;
            }
            Geometry own = Areas.of(r.exposed(), GF).difference(r.exposedAtEdges());
            double outside = own.difference(allowed).getArea();
            if (outside > 1e-6) {
                left.add("roof " + r.ownerId() + " " + outside + " m²");
            }
            // cells exposed only at an edge must lie on an exposed edge or corner of the same
            // structure, which the checks above require to be accepted
            for (int k = 0; k < r.exposedAtEdges().getNumGeometries(); k++) {
                Geometry piece = r.exposedAtEdges().getGeometryN(k);
                boolean onEdge = fresh.edges().stream().anyMatch(e -> e.ownerId().equals(r.ownerId())
                        && piece.isWithinDistance(flat(e.line()), 1e-9))
                        || fresh.corners().stream().anyMatch(c -> c.ownerId().equals(r.ownerId())
                                && piece.isWithinDistance(GF.createPoint(new Coordinate(c.point().x, c.point().y)), cell));
                if (!onEdge) {
                    left.add("roof " + r.ownerId() + " at no exposed edge: " + piece);
                }
            }
        }
        assertThat(left).as("exposed after the proposal, outside accepted items").isEmpty();
        return fresh;
    }

    private static Geometry flat(Geometry g) {
        Coordinate[] cs = g.getCoordinates();
        Coordinate[] out = new Coordinate[cs.length];
        for (int i = 0; i < cs.length; i++) {
            out[i] = new Coordinate(cs[i].x, cs[i].y);
        }
        return out.length == 1 ? GF.createPoint(out[0]) : GF.createLineString(out);
    }
}

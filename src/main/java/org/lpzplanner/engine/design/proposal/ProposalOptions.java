package org.lpzplanner.engine.design.proposal;

import java.util.List;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * What a proposal may use and must respect.
 *
 * @param sphere          the level and the sphere radius rolled
 * @param rodHeights      rod heights the designer allows, metres above what the rod stands on (0.1 to 10 m)
 * @param edgeConductors  whether conductors along roof edges and parapets may be proposed
 * @param ridgeConductors whether conductors along ridges and hips may be proposed
 * @param mastHeights     heights of free-standing masts on the ground that may be proposed (empty: none), 1 to 60 m
 * @param keepOut         plan areas where nothing may be placed (skylights, walkways), local metres
 * @param accepted        plan geometries of exposed items the designer accepted: exposure within
 *                        {@link #ACCEPTED_REACH} m of them needs no cover
 * @param resolution      grid spacing of the analyses, null to let the engine choose
 */
public record ProposalOptions(SphereSpec sphere, List<Double> rodHeights, boolean edgeConductors,
        boolean ridgeConductors, List<Double> mastHeights, List<Polygon> keepOut, List<Geometry> accepted,
        Double resolution) {

    /** How near an exposed point must be to an accepted item's geometry to count as accepted, metres. */
    public static final double ACCEPTED_REACH = 0.25;

    /** Rise of a proposed roof or ridge conductor above the edge it follows (on holders), metres. */
    public static final double CONDUCTOR_RISE = 0.15;

    public ProposalOptions {
        rodHeights = List.copyOf(rodHeights);
        mastHeights = List.copyOf(mastHeights);
        keepOut = List.copyOf(keepOut);
        accepted = List.copyOf(accepted);
        if (sphere == null) {
            throw new IllegalArgumentException("a protection level is required");
        }
        if (rodHeights.isEmpty() && mastHeights.isEmpty() && !edgeConductors && !ridgeConductors) {
            throw new IllegalArgumentException("allow at least one rod height, a mast height or conductors");
        }
        for (double h : rodHeights) {
            if (!(h >= 0.1 && h <= 10)) {
                throw new IllegalArgumentException("rod heights must be between 0.1 m and 10 m, got " + h);
            }
        }
        for (double h : mastHeights) {
            if (!(h >= 1 && h <= 60)) {
                throw new IllegalArgumentException("mast heights must be between 1 m and 60 m, got " + h);
            }
        }
    }

    /** Rods of the given heights only, no conductors, masts, keep-out areas or accepted items. */
    public static ProposalOptions rods(SphereSpec sphere, List<Double> rodHeights) {
        return new ProposalOptions(sphere, rodHeights, false, false, List.of(), List.of(), List.of(), null);
    }

    public ProposalOptions withKeepOut(List<Polygon> areas) {
        return new ProposalOptions(sphere, rodHeights, edgeConductors, ridgeConductors, mastHeights, areas, accepted,
                resolution);
    }

    public ProposalOptions withAccepted(List<Geometry> items) {
        return new ProposalOptions(sphere, rodHeights, edgeConductors, ridgeConductors, mastHeights, keepOut, items,
                resolution);
    }

    public ProposalOptions withResolution(Double h) {
        return new ProposalOptions(sphere, rodHeights, edgeConductors, ridgeConductors, mastHeights, keepOut, accepted, h);
    }
}

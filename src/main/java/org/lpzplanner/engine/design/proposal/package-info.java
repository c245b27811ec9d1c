/**
 * Proposals of air-termination: candidate parts where they can stand, the free spheres that touch
 * each exposed point, a greedy cover of those spheres, and rounds checked by the full analysis
 * ({@link org.lpzplanner.engine.design.proposal.AirTerminationProposer}).
 *
 * <p>Rules of the package: the sampling only guides the choice; the full analysis decides whether
 * a proposal is complete, and what no candidate can reach is reported, never hidden.
 */
package org.lpzplanner.engine.design.proposal;

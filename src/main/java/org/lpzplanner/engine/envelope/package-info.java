/**
 * The rolling sphere itself: supports (the solid's pieces seen from a sphere centre), the lowest
 * free centre over every column ({@link org.lpzplanner.engine.envelope.CentreHeights}, with free
 * space under conductors held clear of the surface), its grey-scale closing by the ball
 * ({@link org.lpzplanner.engine.envelope.BallErosion}), and exact values by branch and bound
 * ({@link org.lpzplanner.engine.envelope.EnvelopeRefiner}); IEC 62305-3:2010 5.2.2 and Annex A.
 *
 * <p>Rules of the package: every value it reports is a lower bound of the true envelope (never
 * above it but for rounding below 1e-9 m), and exact queries are within their stated tolerance of
 * it; each bound's argument is in the javadoc of the class that computes it (docs/engine.md). An
 * update after an edit equals a fresh computation bit for bit. Depends on the model and geom.
 */
package org.lpzplanner.engine.envelope;

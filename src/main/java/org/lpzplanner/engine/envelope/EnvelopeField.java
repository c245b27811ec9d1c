package org.lpzplanner.engine.envelope;

/**
 * The protection envelope E over a site (the LPZ 0A/0B boundary): a point in the air at height z
 * is protected from direct strikes iff z &lt; E(x, y).
 *
 * <p>Holds, per grid cell, a lower bound of E over the whole cell (from the cells' lower bounds of
 * D, eroded on the vertex lattice: min over T's corners u of eroded(u) ≤ min over T of E). Exact
 * queries anywhere go through {@link EnvelopeRefiner}. Immutable and thread-safe.
 */
public final class EnvelopeField {

    private final CentreSurface centres;
    private final EnvelopeRefiner refiner;
    private final double[] vertexLower;

    EnvelopeField(CentreSurface centres, EnvelopeRefiner refiner, double[] vertexLower) {
        this.centres = centres;
        this.refiner = refiner;
        this.vertexLower = vertexLower;
    }

    public Grid grid() { return centres.grid(); }

    double[] vertexLowers() { return vertexLower; }

    public double radius() { return centres.radius(); }

    public CentreSurface centres() { return centres; }

    public EnvelopeRefiner refiner() { return refiner; }

    /** A value ≤ E everywhere in cell (i, j). */
    public double cellLower(int i, int j) {
        int w = grid().nx() + 1;
        int k = j * w + i;
        return Math.min(Math.min(vertexLower[k], vertexLower[k + 1]), Math.min(vertexLower[k + w], vertexLower[k + w + 1]));
    }


    /**
     * E at (x, y), evaluated at that exact point, never above the true value and at most
     * {@code tolerance} below it.
     */
    public double heightAt(double x, double y, double tolerance) {
        return Math.max(0, refiner.atPoint(x, y, tolerance).lower());
    }
}

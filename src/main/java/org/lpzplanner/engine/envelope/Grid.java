package org.lpzplanner.engine.envelope;

/**
 * A square lattice of cells over the site: cell (i, j) is the square
 * [x0 + i·h, x0 + (i+1)·h] × [y0 + j·h, y0 + (j+1)·h]; its node is the centre; its corners are
 * the vertices (i, j) … (i+1, j+1) of the vertex lattice ((nx+1) × (ny+1)).
 */
public record Grid(double x0, double y0, double h, int nx, int ny) {

    public double nodeX(int i) { return x0 + (i + 0.5) * h; }

    public double nodeY(int j) { return y0 + (j + 0.5) * h; }

    public double x1() { return x0 + nx * h; }

    public double y1() { return y0 + ny * h; }

    public int cellCount() { return nx * ny; }

    /** Column of the cell containing x, clamped to the grid. */
    public int column(double x) {
        return Math.max(0, Math.min(nx - 1, (int) Math.floor((x - x0) / h)));
    }

    /** Row of the cell containing y, clamped to the grid. */
    public int row(double y) {
        return Math.max(0, Math.min(ny - 1, (int) Math.floor((y - y0) / h)));
    }

    public boolean contains(double x, double y) {
        return x >= x0 && x <= x1() && y >= y0 && y <= y1();
    }
}

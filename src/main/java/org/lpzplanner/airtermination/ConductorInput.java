package org.lpzplanner.airtermination;

import java.util.List;

/**
 * A new conductor or a conductor's new path: {@code points} in local metres, each [x, y] (then
 * {@code heightAboveRoof}, metres above the surface below, is required for a new one) or each
 * [x, y, elevation above ground] (a catenary wire or any conductor given in 3D).
 */
public record ConductorInput(String id, String name, List<double[]> points, String heightAboveRoof) {
}

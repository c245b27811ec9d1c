/**
 * The site's solid as the engine sees it: planar top faces, their straight 3D edges, the walls
 * under the footprint edges, and the air-termination parts placed where they stand
 * ({@link org.lpzplanner.engine.geom.SiteSurfaceBuilder} → {@link org.lpzplanner.engine.geom.SiteSurface}).
 *
 * <p>Rules of the package: parts are where they are given: a rod stands on what is under its own
 * position (on a parapet only on its line), a conductor fixed to the roof follows every face and
 * step it crosses ({@link org.lpzplanner.engine.geom.SurfaceProfile}, exact piecewise linear), and
 * every placed conductor leg carries its clearance above the solid beneath it. Nothing is moved
 * silently. Depends on the model only; immutable results, thread-safe.
 */
package org.lpzplanner.engine.geom;

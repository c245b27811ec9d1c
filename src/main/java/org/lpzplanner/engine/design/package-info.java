/**
 * Design checks of an air-termination and down-conductor layout by the simple methods of
 * IEC 62305-3:2010: the protective angle method, the mesh method, the number and positions of
 * down-conductors on the outline of each building (structures that overlap or touch), and the
 * separation distance at every point of the protection system, k<sub>c</sub> from the
 * down-conductors the drawn network joins.
 *
 * <p>Rules of the package: plain Java and JTS only; every formula carries its source (standard and
 * clause or table); rules of the trade with no single source are marked as common practice; values
 * recalled rather than derived are marked "from memory". These checks complement the rolling sphere
 * envelope, which remains the reference method of the product: where they disagree, the rolling
 * sphere governs. Results follow the 2010 edition; the 2024 edition revised the separation distance.
 * Safety direction: a separation check errs toward "fails" (the search tolerance counts against it;
 * a down-conductor no drawn part joins carries the whole current) and passes only on drawn routes.
 */
package org.lpzplanner.engine.design;

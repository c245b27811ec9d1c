/**
 * The design page and its API: air-termination proposals in the background (accept, undo), method
 * checks, down-conductors per building, separation distances, metal installations and the bill of
 * quantities, through {@code engine.design}.
 *
 * <p>Rules of the package: depends on air-termination and below; accepted proposals change the site
 * file through the air-termination feature.
 */
package org.lpzplanner.design;

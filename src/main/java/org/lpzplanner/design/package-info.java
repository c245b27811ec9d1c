/**
 * The design page and its API: air-termination proposals in the background (accept, undo), method
 * checks, down-conductors per building, separation distances, metal installations and the bill of
 * quantities, through {@code engine.design}.
 *
 * <p>Rules of the package: depends on air-termination and below; one service per concern; accepted
 * proposals and their undo change the site file through the air-termination feature's batch edits,
 * so through the edit pipeline; a stored proposal is read back as a record, never walked by hand.
 */
package org.lpzplanner.design;

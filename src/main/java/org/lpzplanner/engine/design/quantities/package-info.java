/**
 * The bill of quantities of a design: parts, conductor lengths (placed, along the surface), fixings,
 * down-conductors and test joints, as a table any report writer can print or export as CSV.
 *
 * <p>Rules of the package: quantities come from the placed geometry, never re-derived by hand;
 * rules of the trade with no single source (fixings per metre) are marked as common practice.
 */
package org.lpzplanner.engine.design.quantities;

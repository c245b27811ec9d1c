/**
 * Air-termination parts of a site file: rods and conductors added, moved, reshaped and removed
 * through the JSON API behind the plan editor; the site file rewritten in its own format
 * ({@link org.lpzplanner.airtermination.PartFileEditor}), audited.
 *
 * <p>Rules of the package: depends on the plan and below; the file is the only store of parts.
 */
package org.lpzplanner.airtermination;

/**
 * Air-termination parts of a site file: rods and conductors added, moved, reshaped and removed
 * (one at a time, or many as one change) through the JSON API behind the plan editor; each change
 * rewrites the site file in its own format ({@link org.lpzplanner.airtermination.PartFileEditor}) and
 * is stored, audited and analysed by {@link org.lpzplanner.editing.EditPipeline}.
 *
 * <p>Rules of the package: depends on the plan, editing and below; the file is the only store of
 * parts; a change of parts goes through the edit pipeline, never around it.
 */
package org.lpzplanner.airtermination;

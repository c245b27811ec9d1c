/**
 * The one way a site changes: {@link org.lpzplanner.editing.EditPipeline} applies every change of a
 * stored site (rods and conductors, structure corrections, accepted proposals and their undo,
 * uploads through the page or the API, the demo data) and then analyses the site again.
 *
 * <p>Rules of the package: depends on analysis, sites and below; every feature that changes a site
 * calls it, and nothing else analyses after a change. A change is a value ({@link
 * org.lpzplanner.editing.SiteChange}: what to do to the file text), written by the feature that owns
 * it.
 */
package org.lpzplanner.editing;

/**
 * Comments on a site and the reviewed mark of a revision: every role may add them; they never change
 * a result.
 *
 * <p>Rules of the package: depends on sites and analysis only.
 */
package org.lpzplanner.comments;

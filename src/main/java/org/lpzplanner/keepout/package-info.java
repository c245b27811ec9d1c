/**
 * Keep-out areas stored per site: where proposals must not put parts; drawn hatched on the plans
 * and listed in the report as stored when printed.
 *
 * <p>Rules of the package: depends on sites and analysis only; an outline is checked like a site
 * file's geometry, refused by name.
 */
package org.lpzplanner.keepout;

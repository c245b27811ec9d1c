/**
 * The site list and a site's plan page: upload, rename, duplicate, delete, structure corrections,
 * the plan with its summary and the review list, the review page, and the sites JSON API.
 *
 * <p>Rules of the package: depends on editing, the stored sites, analyses, sections, keep-out areas
 * and comments; uploads and structure corrections go through the edit pipeline; the wording of an
 * analysed plan (drawing, basis and status lines) is {@link org.lpzplanner.plan.PlanPresenter}'s,
 * never a controller's; other features add to the plan page through {@link org.lpzplanner.sites.PlanContribution},
 * never by this package knowing them.
 */
package org.lpzplanner.plan;

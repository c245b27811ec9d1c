/**
 * The risk estimate of a site (IEC 62305-2:2010, through {@code engine.risk}): inputs stored per
 * site, the risk page with the collection-area drawing, its JSON API, the section the report prints,
 * and what the plan page shows of it (a {@link org.lpzplanner.sites.PlanContribution}).
 *
 * <p>Rules of the package: depends on sites and analysis only; no verdict while an input without a
 * safe default is missing.
 */
package org.lpzplanner.risk;

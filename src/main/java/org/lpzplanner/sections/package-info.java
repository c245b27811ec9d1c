/**
 * Vertical sections through a site: the section model ({@link org.lpzplanner.sections.SiteSection}:
 * the surface, the envelope and resting spheres along a cut) drawn to SVG for the page, the section
 * page, and cuts saved per site (table {@code site_cuts}, API {@code /api/sites/{id}/cuts}).
 *
 * <p>Rules of the package: depends on sites and analysis only; one model, several renderers (the
 * report draws the same model to PDF).
 */
package org.lpzplanner.sections;

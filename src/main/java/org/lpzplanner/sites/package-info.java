/**
 * Stored sites: the site file kept verbatim with its earlier versions, name, level, cover details,
 * version for optimistic locking, team; reading a stored file ({@link org.lpzplanner.sites.SiteFiles}),
 * corrected structure values written back into the file, and the contract by which other features
 * add to a site's plan page ({@link org.lpzplanner.sites.PlanContribution}).
 *
 * <p>Rules of the package: knows nothing of analyses, editing, pages or parts (ArchitectureTest);
 * every change of a stored site is versioned and audited; a file is read into the engine's model
 * once per version ({@link org.lpzplanner.sites.ParsedSites}).
 */
package org.lpzplanner.sites;

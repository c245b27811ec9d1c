/**
 * The printed assessment (PDF, PDFBox 3): a stored revision with its inputs → content blocks and
 * schedules → PDF pages; the cautions on every page (docs/report.md).
 *
 * <p>Rules of the package: prints only results this app computed, as stored; what it prints of the
 * site's current data (design, risk, keep-out areas, cuts) it says is read when printed.
 */
package org.lpzplanner.report;

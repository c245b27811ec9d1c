/**
 * The plan drawing: one model of what a plan shows, drawn by several renderers. {@link
 * org.lpzplanner.drawing.PlanDrawing} holds the site's frame (extent in local metres, north up)
 * and typed items on layers (structures, exposed roof areas, edges, corners, facade bands and their
 * side-flash class, model-warning stretches, protected ground, parts, down-conductors, keep-out
 * areas, the collection area) with their labels. {@link org.lpzplanner.drawing.PlanStyle} is the
 * one style table (colour, stroke, dash and legend words of every layer, plan and section alike),
 * {@link org.lpzplanner.drawing.LabelPlacement} the one routine that places labels, and {@link
 * org.lpzplanner.drawing.PlanSvgRenderer} draws a drawing as SVG for the pages; the report draws
 * the same model to PDF ({@code report.PdfPlanPainter}).
 *
 * <p>Rules of the package: knows no feature (ArchitectureTest), only {@code common}; plain Java. The
 * features build drawings from what they own (analysis from a stored result, keepout its areas,
 * risk the collection area, report the down-conductors and numbers) and choose a renderer.
 */
package org.lpzplanner.drawing;

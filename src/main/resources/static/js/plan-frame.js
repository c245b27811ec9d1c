// The plan drawing's frame: how local metres (x east, y north) map to the SVG's own units. The
// server writes the frame on the <svg> element (data-origin-x, data-origin-y: the local point at
// the drawing's top-left margin; data-scale: SVG units per metre; data-margin; data-draw-height:
// where the drawing ends and the legend begins). Every script that draws on the plan or reads a
// click uses these functions, so the conversion exists once.

/** The frame of a plan <svg> element, read from its data attributes. */
export function frameOf(svg) {
  const d = svg.dataset;
  return {
    originX: Number(d.originX), originY: Number(d.originY), scale: Number(d.scale),
    margin: Number(d.margin), drawHeight: Number(d.drawHeight),
  };
}

/** Local metres of a point in SVG units. SVG y grows downwards, local y northwards. */
export function toLocal(frame, p) {
  return { x: frame.originX + (p.x - frame.margin) / frame.scale, y: frame.originY - (p.y - frame.margin) / frame.scale };
}

/** SVG units of a point in local metres; the inverse of toLocal. */
export function toDrawing(frame, x, y) {
  return { x: frame.margin + (x - frame.originX) * frame.scale, y: frame.margin + (frame.originY - y) * frame.scale };
}

/** An SVG points attribute ("x,y x,y ...") for a path of [x, y, ...] points in local metres. */
export function pointsAttribute(frame, path) {
  return path.map((p) => { const q = toDrawing(frame, p[0], p[1]); return q.x + ',' + q.y; }).join(' ');
}

/** True when an SVG point lies on the drawing, not on the legend below it. */
export function onDrawing(frame, p) {
  return p.y <= frame.drawHeight;
}

/** The SVG point under a pointer event (client pixels through the element's screen transform). */
export function eventPoint(svg, event) {
  const point = svg.createSVGPoint();
  point.x = event.clientX;
  point.y = event.clientY;
  return point.matrixTransform(svg.getScreenCTM().inverse());
}

/** Local metres under a pointer event. */
export function eventLocal(svg, event) {
  return toLocal(frameOf(svg), eventPoint(svg, event));
}

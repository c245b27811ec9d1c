// Placing parts on parapets: a point close to a parapet's line moves onto it, so that the part
// stands on the parapet's top. The server takes a part as standing on a parapet only within 1 cm of
// its line; anything farther off stands on what is under it. Pure functions, no page access.

/** How close to a parapet's line (metres) a click or drop is taken to mean the parapet. */
export const SNAP_METRES = 0.3;

/**
 * The nearest point on a parapet's line within {@code reach} metres of (x, y), as
 * { x, y, parapet }, or null when none is that close. Parapets are { structure, x0, y0, x1, y1 }.
 */
export function snapToParapet(x, y, parapets, reach = SNAP_METRES) {
  let best = null;
  let bestDistance = reach;
  for (const p of parapets || []) {
    const vx = p.x1 - p.x0;
    const vy = p.y1 - p.y0;
    const len2 = vx * vx + vy * vy;
    const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((x - p.x0) * vx + (y - p.y0) * vy) / len2));
    const px = p.x0 + t * vx;
    const py = p.y0 + t * vy;
    const d = Math.hypot(x - px, y - py);
    if (d <= bestDistance) {
      bestDistance = d;
      best = { x: px, y: py, parapet: p };
    }
  }
  return best;
}

// Moving things on the plan by pointer and by keys, the same way for rods, conductors and their
// points: a drag follows the pointer and ends in one change (a press that barely moves is a click);
// arrow keys move in steps and the change is sent once the keys rest, so a run of key presses is
// one change and one undo step.

import { round } from './numbers.js';

/** Pixels a pointer must travel before a press counts as a drag. */
export const DRAG_THRESHOLD_PX = 3;

/** Milliseconds the arrow keys must rest before a nudge is sent. */
export const NUDGE_REST_MS = 600;

const ARROWS = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, 1], ArrowDown: [0, -1] };

/** The plan step (metres east, north) of an arrow key: 0.1 m, or 1 m with Shift; null for other keys. */
export function arrowStep(event) {
  const direction = ARROWS[event.key];
  if (!direction) {
    return null;
  }
  const distance = event.shiftKey ? 1 : 0.1;
  return [direction[0] * distance, direction[1] * distance];
}

/** The points moved by offset metres (only point `only` when given), to the centimetre; copies. */
export function shifted(points, offset, only) {
  return points.map((p, k) => {
    const q = p.slice();
    if (only === undefined || k === only) {
      q[0] = round(p[0] + offset[0], 2);
      q[1] = round(p[1] + offset[1], 2);
    }
    return q;
  });
}

/**
 * Follows a pointer from a pointerdown event on target. position(e) gives the pointer's plan
 * position; onMove gets the offset [dx, dy] from the start in those units while the pointer moves;
 * onEnd gets the final offset, or null when the press was a click or the drag was cancelled.
 */
export function followPointer(event, target, { position, onMove, onEnd }) {
  event.preventDefault();
  event.stopPropagation();
  target.setPointerCapture(event.pointerId);
  const start = position(event);
  const startX = event.clientX;
  const startY = event.clientY;
  let moved = false;
  const offset = (e) => { const p = position(e); return [p.x - start.x, p.y - start.y]; };
  const move = (e) => {
    if (Math.abs(e.clientX - startX) + Math.abs(e.clientY - startY) > DRAG_THRESHOLD_PX) {
      moved = true;
    }
    onMove(offset(e), e);
  };
  const end = (e) => {
    target.removeEventListener('pointermove', move);
    target.removeEventListener('pointerup', end);
    target.removeEventListener('pointercancel', end);
    onEnd(moved && e.type !== 'pointercancel' ? offset(e) : null, e);
  };
  target.addEventListener('pointermove', move);
  target.addEventListener('pointerup', end);
  target.addEventListener('pointercancel', end);
}

/**
 * Arrow-key moves of one thing at a time, gathered into one change. step(key, before, [dx, dy])
 * adds a step to the thing named key (a new key starts over from its own before state) and
 * returns the offset so far; once the keys rest for restMs, send(before, offset) is called once.
 * The timer functions are parameters so that the gathering can be tested without waiting.
 */
export class Nudge {
  constructor(send, {
    restMs = NUDGE_REST_MS,
    // wrapped: a browser's setTimeout must be called on the window, not on this object
    setTimer = (f, ms) => globalThis.setTimeout(f, ms),
    clearTimer = (id) => globalThis.clearTimeout(id),
  } = {}) {
    this.send = send;
    this.restMs = restMs;
    this.setTimer = setTimer;
    this.clearTimer = clearTimer;
    this.pending = null;
  }

  step(key, before, delta) {
    if (!this.pending || this.pending.key !== key) {
      this.flush();
      this.pending = { key, before, offset: [0, 0], timer: null };
    }
    const pending = this.pending;
    pending.offset = [round(pending.offset[0] + delta[0], 3), round(pending.offset[1] + delta[1], 3)];
    this.clearTimer(pending.timer);
    pending.timer = this.setTimer(() => this.flush(), this.restMs);
    return pending.offset;
  }

  /** Sends the gathered move now, if there is one. */
  flush() {
    const pending = this.pending;
    if (!pending) {
      return;
    }
    this.pending = null;
    this.clearTimer(pending.timer);
    this.send(pending.before, pending.offset, pending.key);
  }
}

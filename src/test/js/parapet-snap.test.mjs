// Snapping to parapets: the nearest point of a segment is the clamped orthogonal projection
// (closed form: t = ((p - a) . (b - a)) / |b - a|^2, clamped to [0, 1]).
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { SNAP_METRES, snapToParapet } from '../../main/resources/static/js/parapet-snap.js';

const north = { structure: 'Hall', x0: 0, y0: 10, x1: 20, y1: 10 };
const diagonal = { structure: 'Annex', x0: 0, y0: 0, x1: 3, y1: 4 };

test('a point near a parapet moves onto its line', () => {
  const snap = snapToParapet(5, 9.8, [north]);
  assert.equal(snap.parapet, north);
  assert.ok(Math.abs(snap.x - 5) < 1e-12 && Math.abs(snap.y - 10) < 1e-12);
});

test('projection onto a slanted line and clamping at its ends', () => {
  // (3, 1) projects to t = (9 + 4) / 25 = 0.52, the point (1.56, 2.08), at distance 2.2: too far
  assert.equal(snapToParapet(3, 1, [diagonal]), null);
  const near = snapToParapet(1.56 + 0.16, 2.08 - 0.12, [diagonal]); // 0.2 m off along the normal (0.8, -0.6)
  assert.ok(Math.abs(near.x - 1.56) < 1e-9 && Math.abs(near.y - 2.08) < 1e-9);
  const end = snapToParapet(20.2, 10.1, [north]);
  assert.deepEqual([end.x, end.y], [20, 10]);
});

test('only within reach, and the nearest of several', () => {
  assert.equal(snapToParapet(5, 10 - SNAP_METRES - 0.01, [north]), null);
  const inner = { structure: 'Core', x0: 0, y0: 9.7, x1: 20, y1: 9.7 };
  assert.equal(snapToParapet(5, 9.8, [north, inner]).parapet, inner);
  assert.equal(snapToParapet(5, 5, []), null);
  assert.equal(snapToParapet(5, 5, undefined), null);
});

// The plan's frame: local metres (y north) to SVG user units (y down, SVG 1.1 section 7.3) and back.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { frameOf, onDrawing, pointsAttribute, toDrawing, toLocal } from '../../main/resources/static/js/plan-frame.js';

// 2 units per metre, local point (-10, 40) at the top-left margin of 20 units
const frame = { originX: -10, originY: 40, scale: 2, margin: 20, drawHeight: 300 };

test('the frame is read from the svg element data attributes', () => {
  const svg = { dataset: { originX: '-10', originY: '40', scale: '2', margin: '20', drawHeight: '300' } };
  assert.deepEqual(frameOf(svg), frame);
});

test('the origin sits at the margin and north is up', () => {
  assert.deepEqual(toDrawing(frame, -10, 40), { x: 20, y: 20 });
  // one metre east is scale units right, one metre north is scale units up (smaller y)
  assert.deepEqual(toDrawing(frame, -9, 40), { x: 22, y: 20 });
  assert.deepEqual(toDrawing(frame, -10, 41), { x: 20, y: 18 });
});

test('toLocal undoes toDrawing', () => {
  for (const [x, y] of [[0, 0], [12.34, -5.5], [-10, 40], [1e3, 2e3]]) {
    const back = toLocal(frame, toDrawing(frame, x, y));
    assert.ok(Math.abs(back.x - x) < 1e-9 && Math.abs(back.y - y) < 1e-9, `${x},${y} -> ${back.x},${back.y}`);
  }
});

test('a path becomes an svg points attribute; the legend is not the drawing', () => {
  assert.equal(pointsAttribute(frame, [[-10, 40], [0, 40, 7]]), '20,20 40,20');
  assert.equal(onDrawing(frame, { x: 5, y: 300 }), true);
  assert.equal(onDrawing(frame, { x: 5, y: 300.5 }), false);
});

// Moving parts on the plan by keys: steps, offsets and one change per run of key presses.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { arrowStep, Nudge, shifted } from '../../main/resources/static/js/drag.js';

test('arrow keys step 0.1 m, or 1 m with Shift; north is up', () => {
  assert.deepEqual(arrowStep({ key: 'ArrowUp' }), [0, 0.1]);
  assert.deepEqual(arrowStep({ key: 'ArrowLeft', shiftKey: true }), [-1, 0]);
  assert.deepEqual(arrowStep({ key: 'ArrowDown' }), [0, -0.1]);
  assert.equal(arrowStep({ key: 'a' }), null);
});

test('shifting moves all points or only one, to the centimetre, on copies', () => {
  const path = [[0, 0, 5], [10, 0, 5]];
  assert.deepEqual(shifted(path, [0.123, -1]), [[0.12, -1, 5], [10.12, -1, 5]]);
  assert.deepEqual(shifted(path, [1, 1], 1), [[0, 0, 5], [11, 1, 5]]);
  assert.deepEqual(path, [[0, 0, 5], [10, 0, 5]]);
});

/** Timers run by hand: run() fires whatever is still set. */
function manualTimers() {
  let next = 1;
  const set = new Map();
  return {
    setTimer: (f) => { const id = next++; set.set(id, f); return id; },
    clearTimer: (id) => set.delete(id),
    run: () => { const fs = [...set.values()]; set.clear(); fs.forEach((f) => f()); },
    count: () => set.size,
  };
}

test('a run of key presses is sent once, with the summed offset, when the keys rest', () => {
  const timers = manualTimers();
  const sent = [];
  const nudge = new Nudge((before, offset, key) => sent.push({ before, offset, key }), timers);
  const before = { x: 5, y: 5 };
  nudge.step('r1', before, [0.1, 0]);
  nudge.step('r1', { x: 99, y: 99 }, [0.1, 0]);
  const offset = nudge.step('r1', before, [0, -1]);
  assert.deepEqual(offset, [0.2, -1]);
  assert.equal(sent.length, 0);
  assert.equal(timers.count(), 1);
  timers.run();
  assert.deepEqual(sent, [{ before, offset: [0.2, -1], key: 'r1' }]);
  timers.run();
  assert.equal(sent.length, 1);
});

test('moving another part first sends the one moved before', () => {
  const timers = manualTimers();
  const sent = [];
  const nudge = new Nudge((before, offset, key) => sent.push(key + ' ' + offset.join(',')), timers);
  nudge.step('r1', {}, [1, 0]);
  nudge.step('r2', {}, [0, 1]);
  assert.deepEqual(sent, ['r1 1,0']);
  timers.run();
  assert.deepEqual(sent, ['r1 1,0', 'r2 0,1']);
});

test('without timers given, the nudge uses the global ones and sends after the rest', async () => {
  const sent = [];
  const nudge = new Nudge((before, offset) => sent.push(offset), { restMs: 5 });
  nudge.step('r1', {}, [0.1, 0]);
  await new Promise((resolve) => setTimeout(resolve, 40));
  assert.deepEqual(sent, [[0.1, 0]]);
});

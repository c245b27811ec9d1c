// The plan editor's undo history: stored changes are undo steps, refused ones leave the history,
// requests go out one after another in the order asked.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { EditHistory, historyKey } from '../../main/resources/static/js/undo.js';

/** A server stand-in: records each step; refuses those named in refuse. */
function server(refuse = new Set()) {
  const log = [];
  const run = async (step, kind) => {
    const name = await step();
    log.push(kind + ' ' + name);
    return !refuse.has(name);
  };
  return { log, run };
}

const command = (name) => ({ forward: async () => 'do ' + name, backward: async () => 'undo ' + name });

test('undo and redo walk back and forth through stored changes', async () => {
  const s = server();
  const edits = new EditHistory(s.run);
  await edits.perform(command('a'));
  await edits.perform(command('b'));
  await edits.undo();
  await edits.undo();
  assert.equal(edits.canUndo, false);
  await edits.redo();
  assert.deepEqual(s.log, ['saved do a', 'saved do b', 'undone undo b', 'undone undo a', 'redone do a']);
  assert.equal(edits.canUndo, true);
  assert.equal(edits.canRedo, true);
  await edits.perform(command('c'));
  assert.equal(edits.canRedo, false, 'a new change ends what could be redone');
});

test('a refused change is no undo step; a refused undo keeps its step', async () => {
  const s = server(new Set(['do b', 'undo a']));
  const edits = new EditHistory(s.run);
  await edits.perform(command('a'));
  await edits.perform(command('b'));
  assert.equal(edits.undoStack.length, 1);
  await edits.undo();
  assert.equal(edits.canUndo, true);
  assert.equal(edits.canRedo, false);
});

test('two quick undos take back two changes, sent in order', async () => {
  const s = server();
  const edits = new EditHistory(s.run);
  edits.perform(command('a'));
  edits.perform(command('b'));
  await edits.queue;
  const first = edits.undo();
  const second = edits.undo();
  await Promise.all([first, second]);
  assert.deepEqual(s.log.slice(2), ['undone undo b', 'undone undo a']);
});

test('a slow request finishes before the next one starts', async () => {
  const order = [];
  const edits = new EditHistory(async (step) => { await step(); return true; });
  const slow = { forward: () => new Promise((resolve) => setTimeout(() => { order.push('slow'); resolve(); }, 30)) };
  const quick = { forward: async () => { order.push('quick'); } };
  edits.perform(slow);
  await edits.perform(quick);
  assert.deepEqual(order, ['slow', 'quick']);
});

test('the history keys, not while typing in a field', () => {
  const on = (tagName) => ({ tagName });
  assert.equal(historyKey({ key: 'z', ctrlKey: true, target: on('svg') }), 'undo');
  assert.equal(historyKey({ key: 'Z', metaKey: true, shiftKey: true, target: on('DIV') }), 'redo');
  assert.equal(historyKey({ key: 'y', ctrlKey: true, target: on('DIV') }), 'redo');
  assert.equal(historyKey({ key: 'z', ctrlKey: true, target: on('INPUT') }), null);
  assert.equal(historyKey({ key: 'z', target: on('DIV') }), null);
});

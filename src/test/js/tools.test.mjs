// The plan's tools: one active at a time.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { ToolSwitch } from '../../main/resources/static/js/tools.js';

function recorded() {
  const log = [];
  const tools = new ToolSwitch();
  for (const name of ['rod', 'conductor', 'cut']) {
    tools.register(name, { activate: () => log.push('+' + name), deactivate: () => log.push('-' + name) });
  }
  return { log, tools };
}

test('choosing a tool ends the active one first', () => {
  const { log, tools } = recorded();
  tools.choose('rod');
  tools.choose('cut');
  assert.deepEqual(log, ['+rod', '-rod', '+cut']);
  assert.equal(tools.active, 'cut');
  assert.equal(tools.isActive('rod'), false);
});

test('toggle and end', () => {
  const { log, tools } = recorded();
  tools.toggle('conductor');
  tools.toggle('conductor');
  assert.equal(tools.active, null);
  tools.toggle('rod');
  tools.end('cut');
  assert.equal(tools.active, 'rod');
  tools.end('rod');
  tools.choose(null);
  assert.deepEqual(log, ['+conductor', '-conductor', '+rod', '-rod']);
});

test('a tool ended from its own deactivation is not ended twice', () => {
  const tools = new ToolSwitch();
  let ended = 0;
  tools.register('rod', { deactivate: () => { ended++; tools.end('rod'); } });
  tools.choose('rod');
  tools.choose(null);
  assert.equal(ended, 1);
});

test('an unknown tool is an error', () => {
  assert.throws(() => new ToolSwitch().choose('lasso'), /no tool named lasso/);
});

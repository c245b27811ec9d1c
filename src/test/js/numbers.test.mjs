// Numbers as typed and shown on the pages.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { cornerText, fill, oneDecimal, parseCornerLines, parseDecimal, parseNumberList, round }
  from '../../main/resources/static/js/numbers.js';

test('a typed decimal takes a comma as the decimal mark; other text stays for the server to name', () => {
  assert.equal(parseDecimal('12,5'), 12.5);
  assert.equal(parseDecimal(' -3.25 '), -3.25);
  assert.equal(parseDecimal('abc'), 'abc');
  assert.equal(parseDecimal(''), '');
  assert.equal(parseDecimal('Infinity'), 'Infinity');
});

test('rounding and the summary style', () => {
  assert.equal(round(1.23456, 2), 1.23);
  assert.equal(round(-0.125, 1), -0.1);
  assert.equal(oneDecimal(36.04), '36');
  assert.equal(oneDecimal(36.06), '36.1');
  assert.equal(oneDecimal(7), '7');
});

test('messages are filled by position, a missing value keeps its placeholder', () => {
  assert.equal(fill('{0} of {1} parts, {0} again', 3, 8), '3 of 8 parts, 3 again');
  assert.equal(fill('{0} and {1}', 'one'), 'one and {1}');
  assert.equal(fill(undefined, 1), '');
});

test('number lists and corner lines as the design fields write them', () => {
  assert.deepEqual(parseNumberList('2, 3.5,, 5'), [2, 3.5, 5]);
  assert.ok(Number.isNaN(parseNumberList('2, x')[1]));
  assert.deepEqual(parseCornerLines('0 0; 10 0; 10 5\n\n  1,1; 2,2; 3,1  '),
    [[[0, 0], [10, 0], [10, 5]], [[1, 1], [2, 2], [3, 1]]]);
  assert.deepEqual(parseCornerLines('  \n'), []);
  assert.equal(cornerText(1.5, -2), '1.50 -2.00');
});

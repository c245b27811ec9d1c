// The API client of the pages: CSRF header, JSON bodies, and error answers as problem details
// (RFC 9457: the human-readable explanation is the "detail" member).
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { ApiError, csrfHeaders, problemText, requestJson, siteUrl } from '../../main/resources/static/js/api.js';

const page = (meta) => ({ querySelector: (selector) => meta[selector.match(/name="([^"]+)"/)[1]] || null });
const withToken = page({ 'csrf-header': { content: 'X-CSRF-TOKEN' }, 'csrf-token': { content: 'abc123' } });

test('every request carries the session token named by the page', () => {
  assert.deepEqual(csrfHeaders(withToken), { Accept: 'application/json', 'X-CSRF-TOKEN': 'abc123' });
  assert.deepEqual(csrfHeaders(page({})), { Accept: 'application/json' });
});

test('an error message is the problem detail, else the older error member', () => {
  assert.equal(problemText({ type: 'about:blank', title: 'Bad Request', status: 400, detail: 'x must be a number' }),
    'x must be a number');
  assert.equal(problemText({ error: 'the site changed' }), 'the site changed');
  assert.equal(problemText(null), null);
  assert.equal(problemText('text'), null);
});

test('a body goes as JSON with its type, the answer comes back parsed', async () => {
  let seen = null;
  const fetchFn = async (url, options) => {
    seen = { url, options };
    return new Response(JSON.stringify({ version: 4 }), { status: 200, headers: { 'Content-Type': 'application/json' } });
  };
  const answer = await requestJson('PUT', '/api/sites/7/rods/r1', { x: 1.5 }, { fetchFn, doc: withToken });
  assert.deepEqual(answer, { version: 4 });
  assert.equal(seen.url, '/api/sites/7/rods/r1');
  assert.equal(seen.options.method, 'PUT');
  assert.equal(seen.options.headers['Content-Type'], 'application/json');
  assert.equal(seen.options.headers['X-CSRF-TOKEN'], 'abc123');
  assert.deepEqual(JSON.parse(seen.options.body), { x: 1.5 });
});

test('a request without a body sends none', async () => {
  let seen = null;
  const fetchFn = async (url, options) => { seen = options; return new Response(null, { status: 204 }); };
  assert.deepEqual(await requestJson('DELETE', '/api/sites/7/rods/r1', undefined, { fetchFn, doc: withToken }), {});
  assert.equal(seen.body, undefined);
  assert.equal(seen.headers['Content-Type'], undefined);
});

test('an answer outside 2xx rejects with its status and message', async () => {
  const problem = { type: 'about:blank', title: 'Conflict', status: 409, detail: 'the site changed since version 3' };
  const fetchFn = async () => new Response(JSON.stringify(problem), { status: 409, headers: { 'Content-Type': 'application/problem+json' } });
  await assert.rejects(requestJson('POST', '/x', {}, { fetchFn, doc: withToken }), (error) => {
    assert.ok(error instanceof ApiError);
    assert.equal(error.status, 409);
    assert.equal(error.message, 'the site changed since version 3');
    return true;
  });
  const html = async () => new Response('<html>gateway</html>', { status: 502, statusText: 'Bad Gateway' });
  await assert.rejects(requestJson('GET', '/x', undefined, { fetchFn: html, doc: withToken }),
    (error) => error.status === 502 && error.message === 'Bad Gateway');
});

test('site addresses escape the id', () => {
  assert.equal(siteUrl(12, '/parts'), '/api/sites/12/parts');
  assert.equal(siteUrl('a/b'), '/api/sites/a%2Fb');
});

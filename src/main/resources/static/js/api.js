// Talking to the app's JSON API from a page: the session's CSRF token on every request, JSON in and
// out, and an error answer (a problem detail) turned into an ApiError that carries its message and
// status. Every page script calls the API through here.

/** An answer other than 2xx: its HTTP status and the message the server gave. */
export class ApiError extends Error {
  constructor(status, message, body) {
    super(message);
    this.status = status;
    this.body = body;
  }
}

/**
 * The headers every request carries: JSON accepted, and the session's CSRF token, which the page
 * renders into two meta elements (csrf-header names the header, csrf-token holds the value).
 */
export function csrfHeaders(doc = globalThis.document) {
  const headers = { Accept: 'application/json' };
  const header = doc && doc.querySelector('meta[name="csrf-header"]');
  const token = doc && doc.querySelector('meta[name="csrf-token"]');
  if (header && token) {
    headers[header.content] = token.content;
  }
  return headers;
}

/** The message of an error answer: a problem detail's detail, else its error member; null when none. */
export function problemText(body) {
  if (!body || typeof body !== 'object') {
    return null;
  }
  return body.detail || body.error || null;
}

/**
 * Sends one request and reads its JSON answer ({} when it has none). A body is sent as JSON.
 * Rejects with an ApiError for any status outside 2xx.
 */
export async function requestJson(method, url, body, { fetchFn = globalThis.fetch, doc = globalThis.document } = {}) {
  const options = { method, headers: csrfHeaders(doc) };
  if (body !== undefined && body !== null) {
    options.headers['Content-Type'] = 'application/json';
    options.body = JSON.stringify(body);
  }
  const response = await fetchFn(url, options);
  let data = {};
  try {
    data = await response.json();
  } catch (e) {
    data = {};
  }
  if (!response.ok) {
    throw new ApiError(response.status, problemText(data) || String(response.statusText || response.status), data);
  }
  return data;
}

/** The address of a site's API resource: /api/sites/{id} followed by path. */
export function siteUrl(siteId, path = '') {
  return '/api/sites/' + encodeURIComponent(siteId) + path;
}

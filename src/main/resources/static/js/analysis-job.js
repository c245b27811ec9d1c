// Runs the plan page's "analyse again" form in the background: the analysis is queued through the
// API, a progress bar follows it, a button cancels it, and the page reloads with the new result
// when it is stored. Without this module the form posts and waits as before.

import { csrfHeaders, problemText } from './api.js';
import { fill as format } from './numbers.js';

const POLL_MS = 250;

function setUp(form) {
  const box = document.getElementById('analysis-progress');
  const bar = document.getElementById('analysis-progress-bar');
  const text = document.getElementById('analysis-progress-text');
  const cancel = document.getElementById('analysis-cancel');
  const submit = form.querySelector('button[type="submit"]');
  const msg = form.dataset;
  let jobUrl = null;

  function show(fraction, message, running) {
    box.hidden = false;
    bar.hidden = !running;
    bar.value = fraction;
    text.textContent = message;
    cancel.hidden = !running;
    submit.disabled = running;
  }

  function stageName(stage) {
    const key = 'msgStage' + stage.charAt(0).toUpperCase() + stage.slice(1);
    return msg[key] || stage;
  }

  async function follow() {
    const response = await fetch(jobUrl, {headers: {Accept: 'application/json'}});
    const job = await response.json();
    if (!response.ok) {
      show(0, format(msg.msgFailed, problemText(job) || response.status), false);
      return;
    }
    if (job.state === 'DONE') {
      window.location.reload();
      return;
    }
    if (job.state === 'CANCELLED') {
      show(0, msg.msgCancelled, false);
      return;
    }
    if (job.state === 'FAILED') {
      show(0, format(msg.msgFailed, job.error), false);
      return;
    }
    const message = job.state === 'QUEUED' ? msg.msgQueued
      : format(msg.msgProgress, stageName(job.stage || 'envelope'), Math.round(job.fraction * 100));
    show(job.fraction, message, true);
    window.setTimeout(follow, POLL_MS);
  }

  form.addEventListener('submit', async (event) => {
    event.preventDefault();
    const params = new URLSearchParams(new FormData(form));
    params.delete('_csrf'); // sent as a header, not in the address
    params.set('async', 'true');
    const response = await fetch('/api/sites/' + encodeURIComponent(form.dataset.siteId) + '/analyses?' + params,
      {method: 'POST', headers: csrfHeaders()});
    const body = await response.json();
    if (response.status === 429) {
      show(0, format(msg.msgBusy, response.headers.get('Retry-After') || body.retryAfterSeconds), false);
      return;
    }
    if (response.status !== 202) {
      show(0, format(msg.msgFailed, problemText(body) || response.status), false);
      return;
    }
    jobUrl = response.headers.get('Location');
    show(0, msg.msgQueued, true);
    window.setTimeout(follow, POLL_MS);
  });

  cancel.addEventListener('click', async () => {
    if (jobUrl) {
      cancel.disabled = true;
      await fetch(jobUrl, {method: 'DELETE', headers: csrfHeaders()});
      cancel.disabled = false;
    }
  });
}

const form = document.getElementById('analysis-form');
if (form) {
  setUp(form);
}

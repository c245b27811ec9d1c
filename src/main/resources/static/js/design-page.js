// Design page: starts a proposal through the JSON API, polls its progress, draws the proposed parts
// on the plan, accepts them into the site; clicks on the plan add keep-out corners.
import { requestJson } from './api.js';
import { cornerText, fill, parseCornerLines, parseNumberList } from './numbers.js';
import { eventLocal, frameOf, toDrawing } from './plan-frame.js';

const section = document.getElementById('proposal');

if (section) {
  const siteId = section.dataset.siteId;
  const version = Number(section.dataset.version);
  const form = document.getElementById('propose-form');
  const cancelButton = document.getElementById('cancel-proposal');
  const progress = document.getElementById('proposal-progress');
  const status = document.getElementById('proposal-status');
  const errorLine = document.getElementById('proposal-error');
  const result = document.getElementById('proposal-result');
  const keepOut = document.getElementById('keep-out');
  const drawing = document.getElementById('design-drawing');
  const SVG_NS = 'http://www.w3.org/2000/svg';
  let jobId = null;
  let timer = null;

  const fmt = fill;
  const numbers = parseNumberList;
  const areas = parseCornerLines;

  function showError(message) {
    errorLine.textContent = message;
    errorLine.hidden = false;
  }

  const call = (method, url, body) => requestJson(method, url, body);

  // ---- drawing on the plan ----

  function svg() {
    return drawing ? drawing.querySelector('svg') : null;
  }

  function toSvg(x, y) {
    return toDrawing(frameOf(svg()), x, y);
  }

  function toLocal(event) {
    return eventLocal(svg(), event);
  }

  function layer(id) {
    const element = svg();
    let g = element.querySelector('#' + id);
    if (!g) {
      g = document.createElementNS(SVG_NS, 'g');
      g.setAttribute('id', id);
      element.appendChild(g);
    }
    g.replaceChildren();
    return g;
  }

  function drawKeepOut() {
    if (!svg()) {
      return;
    }
    const g = layer('keep-out-layer');
    for (const area of areas(keepOut.value)) {
      if (area.length < 2 || area.some((p) => p.length !== 2 || p.some(Number.isNaN))) {
        continue;
      }
      const shape = document.createElementNS(SVG_NS, 'polygon');
      shape.setAttribute('points', area.map(([x, y]) => { const p = toSvg(x, y); return p.x + ',' + p.y; }).join(' '));
      shape.setAttribute('class', 'keep-out');
      g.appendChild(shape);
    }
  }

  function drawParts(parts) {
    if (!svg()) {
      return;
    }
    const g = layer('proposal-layer');
    for (const part of parts) {
      if (part.path !== undefined) {
        const line = document.createElementNS(SVG_NS, 'polyline');
        line.setAttribute('points', part.path.map(([x, y]) => { const p = toSvg(x, y); return p.x + ',' + p.y; }).join(' '));
        line.setAttribute('class', 'proposed ' + part.kind);
        const title = document.createElementNS(SVG_NS, 'title');
        title.textContent = part.name;
        line.appendChild(title);
        g.appendChild(line);
        continue;
      }
      if (part.x === undefined) {
        continue;
      }
      const p = toSvg(part.x, part.y);
      const circle = document.createElementNS(SVG_NS, 'circle');
      circle.setAttribute('cx', p.x);
      circle.setAttribute('cy', p.y);
      circle.setAttribute('r', 4 + part.height);
      circle.setAttribute('class', 'proposed ' + part.kind);
      const title = document.createElementNS(SVG_NS, 'title');
      title.textContent = part.name;
      circle.appendChild(title);
      g.appendChild(circle);
    }
  }

  if (drawing) {
    drawing.addEventListener('click', (event) => {
      if (!svg()) {
        return;
      }
      const p = toLocal(event);
      const corner = cornerText(p.x, p.y);
      const lines = keepOut.value.split('\n');
      const last = lines[lines.length - 1].trim();
      lines[lines.length - 1] = last === '' ? corner : last + '; ' + corner;
      keepOut.value = lines.join('\n');
      status.textContent = fmt(section.dataset.msgKeepoutPoint, p.x.toFixed(2), p.y.toFixed(2));
      drawKeepOut();
    });
  }
  keepOut.addEventListener('input', drawKeepOut);

  // ---- proposal ----

  function show(job) {
    if (job.state === 'running') {
      progress.hidden = false;
      progress.value = job.fraction;
      status.textContent = fmt(section.dataset.msgRunning, job.stage, Math.round(job.fraction * 100));
      return false;
    }
    progress.hidden = true;
    cancelButton.hidden = true;
    form.querySelector('#propose').disabled = false;
    if (job.state === 'cancelled') {
      status.textContent = section.dataset.msgCancelled;
    } else if (job.state === 'failed') {
      status.textContent = '';
      showError(fmt(section.dataset.msgFailed, job.error || ''));
    } else {
      status.textContent = fmt(section.dataset.msgDone, (job.elapsedMillis / 1000).toFixed(1));
      const share = job.shareOfRegular === null ? '-' : Math.round(job.shareOfRegular * 100);
      document.getElementById('proposal-counts').textContent =
        fmt(section.dataset.msgCounts, job.count, job.regularLayoutCount, share);
      const left = Object.entries(job.left).map(([k, v]) => k + ' ' + v).join(', ');
      document.getElementById('proposal-verdict').textContent = job.complete
        ? section.dataset.msgComplete : fmt(section.dataset.msgIncomplete, left, job.beyondReach);
      document.getElementById('proposal-verdict').className = job.complete ? 'pass' : 'error';
      const list = document.getElementById('proposal-parts');
      list.replaceChildren(...Object.entries(job.counts).map(([k, v]) => {
        const li = document.createElement('li');
        li.textContent = v + ' × ' + k;
        return li;
      }));
      result.hidden = false;
      drawParts(job.parts);
    }
    return true;
  }

  async function poll() {
    try {
      const job = await call('GET', '/api/sites/' + siteId + '/proposals/' + jobId);
      if (!show(job)) {
        timer = setTimeout(poll, 400);
      }
    } catch (e) {
      showError(e.message);
    }
  }

  form.addEventListener('submit', async (event) => {
    event.preventDefault();
    errorLine.hidden = true;
    result.hidden = true;
    clearTimeout(timer);
    const body = { rodHeights: numbers(document.getElementById('rod-heights').value) };
    body.edgeConductors = document.getElementById('edge-conductors').checked;
    body.ridgeConductors = document.getElementById('ridge-conductors').checked;
    const masts = numbers(document.getElementById('mast-heights').value);
    if (masts.length > 0) {
      body.mastHeights = masts;
    }
    const keep = areas(keepOut.value);
    if (keep.length > 0) {
      body.keepOut = keep;
    }
    try {
      const job = await call('POST', '/api/sites/' + siteId + '/proposals', body);
      jobId = job.jobId;
      form.querySelector('#propose').disabled = true;
      cancelButton.hidden = false;
      show(job);
      timer = setTimeout(poll, 300);
    } catch (e) {
      showError(e.message);
    }
  });

  cancelButton.addEventListener('click', async () => {
    if (jobId) {
      try {
        await call('POST', '/api/sites/' + siteId + '/proposals/' + jobId + '/cancel');
      } catch (e) {
        showError(e.message);
      }
    }
  });

  const acceptedActions = document.getElementById('accepted-actions');
  const acceptButton = document.getElementById('accept-proposal');
  let acceptedVersion = null;
  let acceptedJob = null;

  acceptButton.addEventListener('click', async () => {
    errorLine.hidden = true;
    try {
      const answer = await call('POST', '/api/sites/' + siteId + '/proposals/' + jobId + '/accept', { version });
      acceptedVersion = answer.version;
      acceptedJob = jobId;
      acceptButton.disabled = true;
      form.querySelector('#propose').disabled = true;
      document.getElementById('accepted-summary').textContent =
        fmt(section.dataset.msgAccepted, answer.rodIds.length, answer.conductorIds.length);
      acceptedActions.hidden = false;
      status.textContent = '';
    } catch (e) {
      showError(e.message);
    }
  });

  document.getElementById('undo-accept').addEventListener('click', async () => {
    errorLine.hidden = true;
    try {
      await call('POST', '/api/sites/' + siteId + '/proposals/' + acceptedJob + '/undo', { version: acceptedVersion });
      document.getElementById('accepted-summary').textContent = section.dataset.msgUndone;
      document.getElementById('undo-accept').disabled = true;
      window.location.reload();
    } catch (e) {
      showError(e.message);
    }
  });

  drawKeepOut();
}

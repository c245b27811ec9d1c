// Plan editor: places, moves and removes air-termination rods, and draws, reshapes, moves and
// removes conductors, on the plan page through the JSON API, swapping in the new drawing and
// summary after each change. Without this module the page
// stays a read-only plan. All words come from data attributes the server renders from messages.

import { snapToParapet } from './parapet-snap.js';

const root = document.getElementById('plan-editor');
if (root) {
  setUp(root);
}

function setUp(root) {
  const siteId = root.dataset.siteId;
  const text = (name) => root.dataset['msg' + name] || '';
  const drawing = document.getElementById('plan-drawing');
  const statusLine = document.getElementById('editor-status');
  const placeButton = document.getElementById('place-rod');
  const undoButton = document.getElementById('undo-change');
  const redoButton = document.getElementById('redo-change');
  const newForm = document.getElementById('new-rod-form');
  const rodForm = document.getElementById('rod-form');
  const rodSelect = rodForm.elements.rod;

  const conductorButton = document.getElementById('draw-conductor');
  const conductorForm = document.getElementById('new-conductor-form');
  const conductorList = document.getElementById('conductor-form');
  const conductorSelect = conductorList.elements.conductor;
  const deleteConductor = document.getElementById('delete-conductor');
  const vertexSelect = conductorList.elements.vertex;
  const saveConductor = document.getElementById('save-conductor');
  const heightLabel = document.getElementById('conductor-height-label');
  let conductors = [];
  let conductorId = null;
  let vertexIndex = 0;
  let drawingConductor = false;
  let conductorPoints = [];

  let version = Number(root.dataset.version);
  let parapets = [];
  let rods = [];
  let selectedId = null;
  let placing = false;
  let queue = Promise.resolve();
  const undoStack = [];
  const redoStack = [];
  let nudge = null;

  // ---- talking to the server ----

  class ApiError extends Error {
    constructor(status, message) {
      super(message);
      this.status = status;
    }
  }

  async function call(method, path, body) {
    const options = { method, headers: { Accept: 'application/json' } };
    const csrfHeader = document.querySelector('meta[name="csrf-header"]');
    const csrfToken = document.querySelector('meta[name="csrf-token"]');
    if (csrfHeader && csrfToken) {
      options.headers[csrfHeader.content] = csrfToken.content;
    }
    let url = '/api/sites/' + encodeURIComponent(siteId) + path;
    if (method === 'DELETE') {
      url += '?version=' + version;
    } else if (body) {
      options.headers['Content-Type'] = 'application/json';
      options.body = JSON.stringify(Object.assign({}, body, { version }));
    }
    const response = await fetch(url, options);
    let data = {};
    try {
      data = await response.json();
    } catch (e) {
      data = {};
    }
    if (!response.ok) {
      throw new ApiError(response.status, data.detail || data.error || String(response.status));
    }
    return data;
  }

  /** Runs one task after the previous ones, so that changes reach the server in order. */
  function enqueue(task) {
    queue = queue.then(task, task);
    return queue;
  }

  function show(message, failed) {
    statusLine.textContent = message;
    statusLine.classList.toggle('error', Boolean(failed));
  }

  function report(error) {
    if (error instanceof ApiError && error.status === 409) {
      show(text('Conflict'), true);
    } else {
      show(text('Failed') + ': ' + error.message, true);
    }
  }

  // ---- applying an answer ----

  function apply(data) {
    version = data.version;
    document.querySelectorAll('input[name="version"]').forEach((input) => { input.value = String(version); });
    const hadFocus = drawing.contains(document.activeElement);
    drawing.innerHTML = data.svg;
    document.getElementById('plan-basis').textContent = data.basis;
    const status = document.getElementById('plan-status');
    status.textContent = data.status;
    status.className = data.summary.fullyProtected ? 'clear' : 'exposed';
    document.querySelectorAll('#plan-summary [data-summary]').forEach((cell) => {
      const value = data.summary[cell.dataset.summary];
      cell.textContent = typeof value === 'number' && !Number.isInteger(value) ? formatNumber(value) : String(value);
    });
    const printRevision = document.getElementById('print-revision');
    if (printRevision && Number.isInteger(data.summary.revision)) {
      printRevision.href = printRevision.href.replace(/\/revisions\/\d+\/report$/,
        '/revisions/' + data.summary.revision + '/report');
    }
    setParts(data.parts);
    bindDrawing();
    if (hadFocus && selectedId) {
      const circle = rodCircle(selectedId);
      if (circle) {
        circle.focus();
      }
    } else if (hadFocus && conductorId) {
      const handle = drawing.querySelector('circle.conductor-vertex[data-vertex="' + vertexIndex + '"]');
      if (handle) {
        handle.focus();
      }
    }
  }

  /** A whole number when it is one, else one decimal, as the server writes the summary. */
  function formatNumber(value) {
    const rounded = Math.round(value * 10) / 10;
    return Number.isInteger(rounded) ? String(rounded) : rounded.toFixed(1);
  }

  function setParts(parts) {
    parapets = parts.parapets || [];
    conductors = parts.conductors || [];
    const keepConductor = conductorSelect.options[0];
    const chosen = conductorSelect.value;
    conductorSelect.replaceChildren(keepConductor);
    for (const c of conductors) {
      conductorSelect.add(new Option(text('RodOption').replace('{0}', c.name).replace('{1}', c.id), c.id));
    }
    conductorSelect.value = conductors.some((c) => c.id === chosen) ? chosen : '';
    if (!conductorById(conductorId)) {
      conductorId = null;
    }
    rods = parts.rods;
    const keep = rodSelect.options[0];
    rodSelect.replaceChildren(keep);
    for (const rod of rods) {
      const label = text('RodOption').replace('{0}', rod.name).replace('{1}', rod.id);
      rodSelect.add(new Option(label, rod.id));
    }
    if (!rods.some((rod) => rod.id === selectedId)) {
      selectedId = null;
    }
    select(selectedId);
    selectConductor(conductorId, vertexIndex);
  }

  // ---- the drawing's frame ----

  function svg() {
    return drawing.querySelector('svg');
  }

  function frame() {
    const d = svg().dataset;
    return {
      originX: Number(d.originX), originY: Number(d.originY), scale: Number(d.scale),
      margin: Number(d.margin), drawHeight: Number(d.drawHeight),
    };
  }

  function svgPoint(event) {
    const element = svg();
    const point = element.createSVGPoint();
    point.x = event.clientX;
    point.y = event.clientY;
    return point.matrixTransform(element.getScreenCTM().inverse());
  }

  function toLocal(p) {
    const f = frame();
    return { x: f.originX + (p.x - f.margin) / f.scale, y: f.originY - (p.y - f.margin) / f.scale };
  }

  function round(value, places) {
    const factor = 10 ** places;
    return Math.round(value * factor) / factor;
  }

  /**
   * A clicked or dropped plan position (local metres) as the part's position: onto a parapet's
   * line when close to one, said in the status line, so a part meant for the parapet stands on it.
   */
  function placedAt(local) {
    const snap = snapToParapet(local.x, local.y, parapets);
    if (!snap) {
      return { x: round(local.x, 2), y: round(local.y, 2) };
    }
    show(text('Snapped').replace('{0}', snap.parapet.structure));
    return { x: round(snap.x, 3), y: round(snap.y, 3) };
  }

  function rodCircle(id) {
    return Array.from(drawing.querySelectorAll('circle.rod')).find((c) => c.dataset.rodId === id) || null;
  }

  function rodById(id) {
    return rods.find((rod) => rod.id === id) || null;
  }

  function conductorById(id) {
    return conductors.find((c) => c.id === id) || null;
  }

  /** Plan position (SVG units) of a point in local metres. */
  function toDrawing(x, y) {
    const f = frame();
    return { x: f.margin + (x - f.originX) * f.scale, y: f.margin + (f.originY - y) * f.scale };
  }

  // ---- selection and the side form ----

  function select(id) {
    selectedId = id;
    const rod = id ? rodById(id) : null;
    drawing.querySelectorAll('circle.rod').forEach((c) => {
      c.classList.toggle('selected', c.dataset.rodId === id);
      c.setAttribute('aria-pressed', c.dataset.rodId === id ? 'true' : 'false');
    });
    rodSelect.value = rod ? rod.id : '';
    for (const name of ['x', 'y', 'height']) {
      rodForm.elements[name].disabled = !rod;
      rodForm.elements[name].value = rod ? String(rod[name]) : '';
    }
    document.getElementById('save-rod').disabled = !rod;
    document.getElementById('delete-rod').disabled = !rod;
  }

  rodSelect.addEventListener('change', () => select(rodSelect.value || null));

  rodForm.addEventListener('submit', (event) => {
    event.preventDefault();
    const rod = rodById(selectedId);
    if (!rod) {
      return;
    }
    const values = rodForm.elements;
    perform(changeCommand(rod.id, snapshot(rod), {
      x: number(values.x.value), y: number(values.y.value), height: values.height.value.trim(),
    }));
  });

  document.getElementById('delete-rod').addEventListener('click', () => {
    const rod = rodById(selectedId);
    if (rod) {
      perform(removeCommand(rod.id, snapshot(rod)));
    }
  });

  /** A typed decimal as a number (a comma is taken as the decimal mark); else the text for the server to name. */
  function number(value) {
    const cleaned = value.trim().replace(',', '.');
    const parsed = Number(cleaned);
    return cleaned !== '' && Number.isFinite(parsed) ? parsed : value;
  }

  function snapshot(rod) {
    return { x: rod.x, y: rod.y, height: rod.height, name: rod.name };
  }

  // ---- changes, undo and redo ----

  function addCommand(values) {
    let id = values.id || null;
    return {
      async forward() {
        const data = await call('POST', '/rods', Object.assign({}, values, { id }));
        id = data.rodId;
        selectedId = id;
        return data;
      },
      async backward() {
        return call('DELETE', '/rods/' + encodeURIComponent(id));
      },
    };
  }

  function changeCommand(id, before, after) {
    return {
      forward: () => call('PUT', '/rods/' + encodeURIComponent(id), { x: after.x, y: after.y, height: after.height }),
      backward: () => call('PUT', '/rods/' + encodeURIComponent(id), { x: before.x, y: before.y, height: before.height }),
    };
  }

  function removeCommand(id, before) {
    return {
      forward: () => call('DELETE', '/rods/' + encodeURIComponent(id)),
      backward: () => call('POST', '/rods', { id, name: before.name, x: before.x, y: before.y, height: before.height }),
    };
  }

  function addConductorCommand(values) {
    let id = values.id || null;
    return {
      async forward() {
        const data = await call('POST', '/conductors', Object.assign({}, values, { id }));
        id = data.conductorId;
        return data;
      },
      backward: () => call('DELETE', '/conductors/' + encodeURIComponent(id)),
    };
  }

  /** The values that put a removed conductor back as it was. */
  function conductorValues(c) {
    const values = { id: c.id, name: c.name, points: c.path };
    if (c.heightAboveRoof !== null && c.heightAboveRoof !== undefined) {
      values.heightAboveRoof = c.heightAboveRoof;
      values.points = c.path.map((p) => [p[0], p[1]]);
    }
    return values;
  }

  /** The body that gives a conductor the path in {@code values} (a copy of its points). */
  function conductorBody(values) {
    const body = { points: values.points.map((p) => p.slice()) };
    if (values.heightAboveRoof !== null && values.heightAboveRoof !== undefined) {
      body.heightAboveRoof = values.heightAboveRoof;
    }
    return body;
  }

  function changeConductorCommand(id, before, after) {
    return {
      forward: () => call('PUT', '/conductors/' + encodeURIComponent(id), conductorBody(after)),
      backward: () => call('PUT', '/conductors/' + encodeURIComponent(id), conductorBody(before)),
    };
  }

  /** A conductor's path (a copy) and height as a change sends them: [x, y] with heightAboveRoof, or [x, y, z]. */
  function conductorShape(c) {
    const values = conductorValues(c);
    values.points = values.points.map((p) => p.slice());
    return values;
  }

  function removeConductorCommand(c) {
    return {
      forward: () => call('DELETE', '/conductors/' + encodeURIComponent(c.id)),
      backward: () => call('POST', '/conductors', conductorValues(c)),
    };
  }

  function updateButtons() {
    undoButton.disabled = undoStack.length === 0;
    redoButton.disabled = redoStack.length === 0;
  }

  function run(step, message, onDone) {
    return enqueue(async () => {
      show(text('Working'), false);
      root.setAttribute('aria-busy', 'true');
      try {
        apply(await step());
        onDone();
        show(message, false);
      } catch (error) {
        report(error);
        try {
          setParts(await call('GET', '/parts'));
          bindDrawing();
        } catch (ignored) {
          // the status line already says what went wrong
        }
        select(selectedId);
      } finally {
        root.removeAttribute('aria-busy');
        updateButtons();
      }
    });
  }

  function perform(command) {
    return run(() => command.forward(), text('Saved'), () => {
      undoStack.push(command);
      redoStack.length = 0;
    });
  }

  function undo() {
    const command = undoStack.pop();
    if (!command) {
      return queue;
    }
    return run(() => command.backward(), text('Undone'), () => redoStack.push(command))
      .then(() => { if (!redoStack.includes(command)) undoStack.push(command); updateButtons(); });
  }

  function redo() {
    const command = redoStack.pop();
    if (!command) {
      return queue;
    }
    return run(() => command.forward(), text('Redone'), () => undoStack.push(command))
      .then(() => { if (!undoStack.includes(command)) redoStack.push(command); updateButtons(); });
  }

  undoButton.addEventListener('click', () => undo());
  redoButton.addEventListener('click', () => redo());

  document.addEventListener('keydown', (event) => {
    const target = event.target;
    const typing = target instanceof HTMLInputElement || target instanceof HTMLTextAreaElement
      || target instanceof HTMLSelectElement;
    if (!(event.ctrlKey || event.metaKey) || typing) {
      return;
    }
    const key = event.key.toLowerCase();
    if (key === 'z' && !event.shiftKey) {
      event.preventDefault();
      undo();
    } else if (key === 'y' || (key === 'z' && event.shiftKey)) {
      event.preventDefault();
      redo();
    }
  });

  // ---- drawing a new conductor ----

  function conductorPreview() {
    const element = svg();
    if (!element) {
      return;
    }
    let line = element.querySelector('polyline.conductor-draft');
    if (!line) {
      line = document.createElementNS('http://www.w3.org/2000/svg', 'polyline');
      line.setAttribute('class', 'conductor-draft');
      element.appendChild(line);
    }
    const f = frame();
    line.setAttribute('points', conductorPoints.map((p) => (f.margin + (p[0] - f.originX) * f.scale) + ','
      + (f.margin + (f.originY - p[1]) * f.scale)).join(' '));
  }

  function setDrawingConductor(on) {
    if (on) {
      setPlacing(false);
    }
    drawingConductor = on;
    conductorPoints = [];
    conductorForm.elements.count.value = '0';
    conductorButton.setAttribute('aria-pressed', on ? 'true' : 'false');
    drawing.classList.toggle('placing', on);
    conductorForm.hidden = !on;
    const draft = svg() && svg().querySelector('polyline.conductor-draft');
    if (draft) {
      draft.remove();
    }
    if (on) {
      show(text('Drawing'), false);
    }
  }

  conductorButton.addEventListener('click', () => setDrawingConductor(!drawingConductor));
  document.getElementById('cancel-conductor').addEventListener('click', () => {
    setDrawingConductor(false);
    conductorButton.focus();
  });

  conductorForm.addEventListener('submit', (event) => {
    event.preventDefault();
    const values = conductorForm.elements;
    const height = number(values.height.value);
    const body = { points: conductorPoints.slice() };
    if (values.mounting.value === 'wire') {
      body.points = body.points.map((p) => [p[0], p[1], height]);
    } else {
      body.heightAboveRoof = height;
    }
    const name = values.name.value.trim();
    if (name) {
      body.name = name;
    }
    setDrawingConductor(false);
    values.name.value = '';
    perform(addConductorCommand(body));
  });

  conductorSelect.addEventListener('change', () => selectConductor(conductorSelect.value || null, 0));
  vertexSelect.addEventListener('change', () => selectConductor(conductorId, Number(vertexSelect.value)));

  conductorList.addEventListener('submit', (event) => {
    event.preventDefault();
    const c = conductorById(conductorId);
    if (!c) {
      return;
    }
    const values = conductorList.elements;
    const before = conductorShape(c);
    const after = conductorShape(c);
    after.points[vertexIndex][0] = number(values.x.value);
    after.points[vertexIndex][1] = number(values.y.value);
    if (after.heightAboveRoof !== null && after.heightAboveRoof !== undefined) {
      after.heightAboveRoof = number(values.height.value);
    } else {
      after.points[vertexIndex][2] = number(values.height.value);
    }
    perform(changeConductorCommand(c.id, before, after));
  });

  // ---- a selected conductor: its points as handles on the plan ----

  /** Selects a conductor and one of its points: list, form, highlight and handles. */
  function selectConductor(id, index) {
    const c = conductorById(id);
    conductorId = c ? c.id : null;
    vertexIndex = c ? Math.min(Math.max(0, index || 0), c.path.length - 1) : 0;
    conductorSelect.value = conductorId || '';
    deleteConductor.disabled = !c;
    saveConductor.disabled = !c;
    vertexSelect.replaceChildren();
    if (c) {
      c.path.forEach((p, k) => vertexSelect.add(new Option(text('VertexOption').replace('{0}', String(k + 1)), String(k))));
      vertexSelect.value = String(vertexIndex);
    }
    const values = conductorList.elements;
    for (const name of ['vertex', 'x', 'y', 'height']) {
      values[name].disabled = !c;
    }
    const roof = c && c.heightAboveRoof !== null && c.heightAboveRoof !== undefined;
    heightLabel.textContent = roof ? heightLabel.dataset.roof : heightLabel.dataset.wire;
    const p = c ? c.path[vertexIndex] : null;
    values.x.value = p ? String(p[0]) : '';
    values.y.value = p ? String(p[1]) : '';
    values.height.value = !c ? '' : roof ? String(c.heightAboveRoof) : String(p[2]);
    drawHandles();
  }

  /** Draws the selected conductor's highlight and one focusable handle per point. */
  function drawHandles() {
    const element = svg();
    if (!element) {
      return;
    }
    element.querySelectorAll('.conductor-handles').forEach((g) => g.remove());
    element.querySelectorAll('path.conductor').forEach((path) => {
      path.classList.toggle('selected', path.dataset.conductorId === conductorId);
    });
    const c = conductorById(conductorId);
    if (!c) {
      return;
    }
    const ns = 'http://www.w3.org/2000/svg';
    const group = document.createElementNS(ns, 'g');
    group.setAttribute('class', 'conductor-handles');
    const line = document.createElementNS(ns, 'polyline');
    line.setAttribute('class', 'conductor-outline');
    line.dataset.conductorId = c.id;
    line.setAttribute('points', c.path.map((p) => { const q = toDrawing(p[0], p[1]); return q.x + ',' + q.y; }).join(' '));
    line.addEventListener('pointerdown', startConductorDrag);
    group.appendChild(line);
    c.path.forEach((p, k) => {
      const q = toDrawing(p[0], p[1]);
      const handle = document.createElementNS(ns, 'circle');
      handle.setAttribute('class', 'conductor-vertex' + (k === vertexIndex ? ' selected' : ''));
      handle.setAttribute('cx', String(q.x));
      handle.setAttribute('cy', String(q.y));
      handle.setAttribute('r', '6');
      handle.setAttribute('tabindex', '0');
      handle.setAttribute('role', 'button');
      handle.setAttribute('aria-label', text('VertexLabel').replace('{0}', String(k + 1)).replace('{1}', c.name));
      handle.dataset.conductorId = c.id;
      handle.dataset.vertex = String(k);
      handle.addEventListener('pointerdown', startVertexDrag);
      handle.addEventListener('focus', () => markVertex(k));
      handle.addEventListener('keydown', nudgeVertexByKey);
      group.appendChild(handle);
    });
    element.appendChild(group);
  }

  /** Marks a point as the selected one without redrawing, so that focus stays on its handle. */
  function markVertex(k) {
    const c = conductorById(conductorId);
    if (!c) {
      return;
    }
    vertexIndex = k;
    vertexSelect.value = String(k);
    svg().querySelectorAll('circle.conductor-vertex').forEach((h) => {
      h.classList.toggle('selected', Number(h.dataset.vertex) === k);
    });
    const values = conductorList.elements;
    values.x.value = String(c.path[k][0]);
    values.y.value = String(c.path[k][1]);
    if (c.heightAboveRoof === null || c.heightAboveRoof === undefined) {
      values.height.value = String(c.path[k][2]);
    }
  }

  /** Moves the outline and handles to show {@code points} (local metres) while dragging. */
  function showPath(points) {
    const element = svg();
    const line = element.querySelector('polyline.conductor-outline');
    if (line) {
      line.setAttribute('points', points.map((p) => { const q = toDrawing(p[0], p[1]); return q.x + ',' + q.y; }).join(' '));
    }
    element.querySelectorAll('circle.conductor-vertex').forEach((h) => {
      const p = points[Number(h.dataset.vertex)];
      const q = toDrawing(p[0], p[1]);
      h.setAttribute('cx', String(q.x));
      h.setAttribute('cy', String(q.y));
    });
  }

  /** Follows a pointer from {@code event}; {@code moveTo} gets the plan offset in metres. */
  function dragFrom(event, target, moveTo, done) {
    event.preventDefault();
    event.stopPropagation();
    target.setPointerCapture(event.pointerId);
    const start = toLocal(svgPoint(event));
    const startX = event.clientX;
    const startY = event.clientY;
    let moved = false;
    const offset = (e) => { const p = toLocal(svgPoint(e)); return [p.x - start.x, p.y - start.y]; };
    const move = (e) => {
      if (Math.abs(e.clientX - startX) + Math.abs(e.clientY - startY) > 3) {
        moved = true;
      }
      moveTo(offset(e));
    };
    const end = (e) => {
      target.removeEventListener('pointermove', move);
      target.removeEventListener('pointerup', end);
      target.removeEventListener('pointercancel', end);
      done(moved && e.type !== 'pointercancel' ? offset(e) : null);
    };
    target.addEventListener('pointermove', move);
    target.addEventListener('pointerup', end);
    target.addEventListener('pointercancel', end);
  }

  /** The points moved by {@code offset} metres (only point {@code only} when given), to the centimetre. */
  function shifted(points, offset, only) {
    return points.map((p, k) => {
      if (only !== undefined && k !== only) {
        return p.slice();
      }
      const q = p.slice();
      q[0] = round(p[0] + offset[0], 2);
      q[1] = round(p[1] + offset[1], 2);
      return q;
    });
  }

  function startVertexDrag(event) {
    const handle = event.currentTarget;
    const c = conductorById(handle.dataset.conductorId);
    const k = Number(handle.dataset.vertex);
    if (!c || event.button !== 0 || placing || drawingConductor) {
      return;
    }
    markVertex(k);
    dragFrom(event, handle, (offset) => showPath(shifted(c.path, offset, k)), (offset) => {
      if (!offset) {
        handle.focus();
        return;
      }
      const after = conductorShape(c);
      after.points = shifted(after.points, offset, k);
      perform(changeConductorCommand(c.id, conductorShape(c), after));
    });
  }

  function startConductorDrag(event) {
    const c = conductorById(event.currentTarget.dataset.conductorId);
    if (!c || event.button !== 0 || placing || drawingConductor) {
      return;
    }
    dragFrom(event, event.currentTarget, (offset) => showPath(shifted(c.path, offset)), (offset) => {
      if (!offset) {
        return;
      }
      const after = conductorShape(c);
      after.points = shifted(after.points, offset);
      perform(changeConductorCommand(c.id, conductorShape(c), after));
    });
  }

  let vertexNudge = null;

  /** Arrow keys move the selected point; the move is saved once the keys rest for a moment. */
  function nudgeVertexByKey(event) {
    const step = ARROWS[event.key];
    const c = conductorById(conductorId);
    if (!step || !c) {
      return;
    }
    event.preventDefault();
    const distance = event.shiftKey ? 1 : 0.1;
    const k = Number(event.currentTarget.dataset.vertex);
    if (!vertexNudge || vertexNudge.id !== c.id || vertexNudge.vertex !== k) {
      vertexNudge = { id: c.id, vertex: k, before: conductorShape(c), offset: [0, 0], timer: null };
    }
    vertexNudge.offset = [round(vertexNudge.offset[0] + step[0] * distance, 3),
      round(vertexNudge.offset[1] + step[1] * distance, 3)];
    const points = shifted(vertexNudge.before.points, vertexNudge.offset, k);
    showPath(points);
    conductorList.elements.x.value = String(points[k][0]);
    conductorList.elements.y.value = String(points[k][1]);
    clearTimeout(vertexNudge.timer);
    const pending = vertexNudge;
    pending.timer = setTimeout(() => {
      vertexNudge = null;
      const after = Object.assign({}, pending.before, { points: shifted(pending.before.points, pending.offset, pending.vertex) });
      perform(changeConductorCommand(pending.id, pending.before, after));
    }, 600);
  }

  deleteConductor.addEventListener('click', () => {
    const c = conductorById(conductorId);
    if (c) {
      perform(removeConductorCommand(c));
    }
  });

  // ---- placing a new rod ----

  function setPlacing(on) {
    placing = on;
    placeButton.setAttribute('aria-pressed', on ? 'true' : 'false');
    drawing.classList.toggle('placing', on);
    newForm.hidden = !on;
    if (on) {
      show(text('Placing'), false);
    }
  }

  placeButton.addEventListener('click', () => {
    if (drawingConductor) {
      setDrawingConductor(false);
    }
    setPlacing(!placing);
    if (placing) {
      newForm.elements.x.focus();
    }
  });

  document.getElementById('cancel-rod').addEventListener('click', () => {
    setPlacing(false);
    placeButton.focus();
  });

  newForm.addEventListener('submit', (event) => {
    event.preventDefault();
    const values = newForm.elements;
    const choice = values.heightChoice.value;
    const height = choice === 'other' ? values.heightOther.value.trim() : choice;
    const name = values.name.value.trim();
    const rod = { x: number(values.x.value), y: number(values.y.value), height };
    if (name) {
      rod.name = name;
    }
    setPlacing(false);
    values.name.value = '';
    perform(addCommand(rod));
  });

  // ---- the drawing: clicks, dragging, keys ----

  function bindDrawing() {
    const element = svg();
    if (!element) {
      return;
    }
    element.addEventListener('click', (event) => {
      if (drawingConductor) {
        const q = svgPoint(event);
        if (q.y <= frame().drawHeight) {
          const at = placedAt(toLocal(q));
          conductorPoints.push([at.x, at.y]);
          conductorForm.elements.count.value = String(conductorPoints.length);
          conductorPreview();
        }
        return;
      }
      const clicked = event.target.closest('path.conductor, polyline.conductor-hit');
      if (!placing && clicked) {
        selectConductor(clicked.dataset.conductorId, 0);
        return;
      }
      if (!placing || event.target.closest('circle.rod')) {
        return;
      }
      const p = svgPoint(event);
      if (p.y > frame().drawHeight) {
        return;
      }
      const at = placedAt(toLocal(p));
      newForm.elements.x.value = String(at.x);
      newForm.elements.y.value = String(at.y);
      newForm.hidden = false;
      newForm.elements.heightChoice.focus();
    });
    element.querySelectorAll('circle.rod').forEach((circle) => {
      circle.setAttribute('tabindex', '0');
      circle.setAttribute('role', 'button');
      const rod = rodById(circle.dataset.rodId);
      if (rod) {
        circle.setAttribute('aria-label', text('RodOption').replace('{0}', rod.name).replace('{1}', rod.id));
      }
      circle.addEventListener('pointerdown', startDrag);
      circle.addEventListener('focus', () => select(circle.dataset.rodId));
      circle.addEventListener('keydown', nudgeByKey);
    });
    addConductorHits(element);
    select(selectedId);
    drawHandles();
  }

  /** A wide transparent line over each conductor, so that a thin dashed line is easy to click. */
  function addConductorHits(element) {
    const ns = 'http://www.w3.org/2000/svg';
    element.querySelectorAll('polyline.conductor-hit').forEach((hit) => hit.remove());
    const firstRod = element.querySelector('circle.rod');
    for (const c of conductors) {
      const hit = document.createElementNS(ns, 'polyline');
      hit.setAttribute('class', 'conductor-hit');
      hit.dataset.conductorId = c.id;
      hit.setAttribute('points', c.path.map((p) => { const q = toDrawing(p[0], p[1]); return q.x + ',' + q.y; }).join(' '));
      element.insertBefore(hit, firstRod);
    }
  }

  function startDrag(event) {
    const circle = event.currentTarget;
    const id = circle.dataset.rodId;
    const rod = rodById(id);
    if (!rod || event.button !== 0) {
      return;
    }
    event.preventDefault();
    select(id);
    circle.setPointerCapture(event.pointerId);
    const startX = event.clientX;
    const startY = event.clientY;
    let moved = false;
    const move = (e) => {
      if (Math.abs(e.clientX - startX) + Math.abs(e.clientY - startY) > 3) {
        moved = true;
      }
      const p = svgPoint(e);
      circle.setAttribute('cx', String(p.x));
      circle.setAttribute('cy', String(p.y));
    };
    const end = (e) => {
      circle.removeEventListener('pointermove', move);
      circle.removeEventListener('pointerup', end);
      circle.removeEventListener('pointercancel', end);
      if (!moved || e.type === 'pointercancel') {
        circle.focus();
        return;
      }
      const at = placedAt(toLocal(svgPoint(e)));
      perform(changeCommand(id, snapshot(rod), { x: at.x, y: at.y, height: rod.height }));
    };
    circle.addEventListener('pointermove', move);
    circle.addEventListener('pointerup', end);
    circle.addEventListener('pointercancel', end);
  }

  const ARROWS = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, 1], ArrowDown: [0, -1] };

  /** Arrow keys move the selected rod; the move is saved once the keys rest for a moment. */
  function nudgeByKey(event) {
    const step = ARROWS[event.key];
    const rod = rodById(selectedId);
    if (!step || !rod) {
      return;
    }
    event.preventDefault();
    const distance = event.shiftKey ? 1 : 0.1;
    if (!nudge || nudge.id !== rod.id) {
      nudge = { id: rod.id, before: snapshot(rod), x: rod.x, y: rod.y, timer: null };
    }
    nudge.x = round(nudge.x + step[0] * distance, 3);
    nudge.y = round(nudge.y + step[1] * distance, 3);
    const f = frame();
    const circle = rodCircle(rod.id);
    if (circle) {
      circle.setAttribute('cx', String(f.margin + (nudge.x - f.originX) * f.scale));
      circle.setAttribute('cy', String(f.margin + (f.originY - nudge.y) * f.scale));
    }
    rodForm.elements.x.value = String(nudge.x);
    rodForm.elements.y.value = String(nudge.y);
    clearTimeout(nudge.timer);
    const pending = nudge;
    pending.timer = setTimeout(() => {
      nudge = null;
      perform(changeCommand(pending.id, pending.before, { x: pending.x, y: pending.y, height: pending.before.height }));
    }, 600);
  }

  // ---- start ----

  enqueue(async () => {
    try {
      setParts(await call('GET', '/parts'));
      bindDrawing();
      root.hidden = false;
    } catch (error) {
      report(error);
    }
  });
}

// Plan editor: places, moves and removes air-termination rods, and draws, reshapes, moves and
// removes conductors, on the plan page through the JSON API, swapping in the new drawing and
// summary after each change. Without this module the page stays a read-only plan. All words come
// from data attributes the server renders from messages. The pure parts live in the modules it
// imports: the API client, the plan's frame, dragging and nudging, the undo history, the tools.

import { ApiError, requestJson, siteUrl } from './api.js';
import { arrowStep, followPointer, Nudge, shifted } from './drag.js';
import { oneDecimal, parseDecimal, round } from './numbers.js';
import { snapToParapet } from './parapet-snap.js';
import { eventPoint, frameOf, onDrawing, pointsAttribute, toDrawing as frameToDrawing, toLocal as frameToLocal } from './plan-frame.js';
import { planTools } from './tools.js';
import { EditHistory, historyKey } from './undo.js';

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
  let conductorPoints = [];

  let version = Number(root.dataset.version);
  let parapets = [];
  let rods = [];
  let selectedId = null;
  const placing = () => planTools.isActive('rod');
  const drawingConductor = () => planTools.isActive('conductor');

  // ---- talking to the server ----

  /** One request about this site; every change carries the version it was made on. */
  function call(method, path, body) {
    if (method === 'DELETE') {
      return requestJson(method, siteUrl(siteId, path) + '?version=' + version);
    }
    return requestJson(method, siteUrl(siteId, path), body ? Object.assign({}, body, { version }) : undefined);
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
    if (data.analysisPending) {
      // the change is stored, its analysis is not: the drawing and summary stay those of the last one
      const status = document.getElementById('plan-status');
      status.textContent = data.status;
      status.className = 'exposed';
      setParts(data.parts);
      bindDrawing();
      return;
    }
    const hadFocus = drawing.contains(document.activeElement);
    drawing.innerHTML = data.svg;
    document.getElementById('plan-basis').textContent = data.basis;
    const status = document.getElementById('plan-status');
    status.textContent = data.status;
    status.className = data.summary.fullyProtected ? 'clear' : 'exposed';
    document.querySelectorAll('#plan-summary [data-summary]').forEach((cell) => {
      const value = data.summary[cell.dataset.summary];
      cell.textContent = typeof value === 'number' && !Number.isInteger(value) ? oneDecimal(value) : String(value);
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
    return frameOf(svg());
  }

  function svgPoint(event) {
    return eventPoint(svg(), event);
  }

  function toLocal(p) {
    return frameToLocal(frame(), p);
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
    return frameToDrawing(frame(), x, y);
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

  const number = parseDecimal;

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
    undoButton.disabled = !edits.canUndo;
    redoButton.disabled = !edits.canRedo;
  }

  const DONE = { saved: 'Saved', undone: 'Undone', redone: 'Redone' };

  /**
   * Sends one step and shows its answer; true when the server stored the change (also when its
   * analysis is pending), false when it refused it, after which the parts are read again.
   */
  async function run(step, kind) {
    show(text('Working'), false);
    root.setAttribute('aria-busy', 'true');
    try {
      const data = await step();
      apply(data);
      show(data.analysisPending ? text('Pending').replace('{0}', data.pendingReason) : text(DONE[kind]), false);
      return true;
    } catch (error) {
      report(error);
      try {
        setParts(await call('GET', '/parts'));
        bindDrawing();
      } catch (ignored) {
        // the status line already says what went wrong
      }
      select(selectedId);
      return false;
    } finally {
      root.removeAttribute('aria-busy');
    }
  }

  const edits = new EditHistory(run, updateButtons);

  function perform(command) {
    return edits.perform(command);
  }

  undoButton.addEventListener('click', () => edits.undo());
  redoButton.addEventListener('click', () => edits.redo());

  document.addEventListener('keydown', (event) => {
    const asked = historyKey(event);
    if (asked) {
      event.preventDefault();
      edits[asked]();
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
    line.setAttribute('points', pointsAttribute(frame(), conductorPoints));
  }

  /** The conductor tool's look while it is chosen or ended (through planTools only). */
  function showDrawingConductor(on) {
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

  planTools.register('conductor', { activate: () => showDrawingConductor(true), deactivate: () => showDrawingConductor(false) });
  conductorButton.addEventListener('click', () => planTools.toggle('conductor'));
  document.getElementById('cancel-conductor').addEventListener('click', () => {
    planTools.end('conductor');
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
    planTools.end('conductor');
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
    line.setAttribute('points', pointsAttribute(frame(), c.path));
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
      line.setAttribute('points', pointsAttribute(frame(), points));
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
    followPointer(event, target, { position: (e) => toLocal(svgPoint(e)), onMove: moveTo, onEnd: done });
  }

  function startVertexDrag(event) {
    const handle = event.currentTarget;
    const c = conductorById(handle.dataset.conductorId);
    const k = Number(handle.dataset.vertex);
    if (!c || event.button !== 0 || placing() || drawingConductor()) {
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
    if (!c || event.button !== 0 || placing() || drawingConductor()) {
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

  // the key is "conductor id#point index"; an id from a file may itself hold a '#', so the index is
  // read after the last one and the id from the conductor's own values
  const vertexNudge = new Nudge((before, offset, key) => {
    const k = Number(key.slice(key.lastIndexOf('#') + 1));
    const after = Object.assign({}, before, { points: shifted(before.points, offset, k) });
    perform(changeConductorCommand(before.id, before, after));
  });

  /** Arrow keys move the selected point; the move is saved once the keys rest for a moment. */
  function nudgeVertexByKey(event) {
    const step = arrowStep(event);
    const c = conductorById(conductorId);
    if (!step || !c) {
      return;
    }
    event.preventDefault();
    const k = Number(event.currentTarget.dataset.vertex);
    const key = c.id + '#' + k;
    const before = vertexNudge.pending && vertexNudge.pending.key === key ? vertexNudge.pending.before : conductorShape(c);
    const offset = vertexNudge.step(key, before, step);
    const points = shifted(before.points, offset, k);
    showPath(points);
    conductorList.elements.x.value = String(points[k][0]);
    conductorList.elements.y.value = String(points[k][1]);
  }

  deleteConductor.addEventListener('click', () => {
    const c = conductorById(conductorId);
    if (c) {
      perform(removeConductorCommand(c));
    }
  });

  // ---- placing a new rod ----

  /** The rod tool's look while it is chosen or ended (through planTools only). */
  function showPlacing(on) {
    placeButton.setAttribute('aria-pressed', on ? 'true' : 'false');
    drawing.classList.toggle('placing', on);
    newForm.hidden = !on;
    if (on) {
      show(text('Placing'), false);
    }
  }

  planTools.register('rod', { activate: () => showPlacing(true), deactivate: () => showPlacing(false) });

  placeButton.addEventListener('click', () => {
    planTools.toggle('rod');
    if (placing()) {
      newForm.elements.x.focus();
    }
  });

  document.getElementById('cancel-rod').addEventListener('click', () => {
    planTools.end('rod');
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
    planTools.end('rod');
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
      if (drawingConductor()) {
        const q = svgPoint(event);
        if (onDrawing(frame(), q)) {
          const at = placedAt(toLocal(q));
          conductorPoints.push([at.x, at.y]);
          conductorForm.elements.count.value = String(conductorPoints.length);
          conductorPreview();
        }
        return;
      }
      const clicked = event.target.closest('path.conductor, polyline.conductor-hit');
      if (!placing() && clicked) {
        selectConductor(clicked.dataset.conductorId, 0);
        return;
      }
      if (!placing() || event.target.closest('circle.rod')) {
        return;
      }
      const p = svgPoint(event);
      if (!onDrawing(frame(), p)) {
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
      hit.setAttribute('points', pointsAttribute(frame(), c.path));
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
    select(id);
    const start = toDrawing(rod.x, rod.y);
    followPointer(event, circle, {
      position: (e) => svgPoint(e),
      onMove: (offset) => {
        circle.setAttribute('cx', String(start.x + offset[0]));
        circle.setAttribute('cy', String(start.y + offset[1]));
      },
      onEnd: (offset, e) => {
        if (!offset) {
          circle.focus();
          return;
        }
        const at = placedAt(toLocal(svgPoint(e)));
        perform(changeCommand(id, snapshot(rod), { x: at.x, y: at.y, height: rod.height }));
      },
    });
  }

  const rodNudge = new Nudge((before, offset, id) => {
    perform(changeCommand(id, before, { x: round(before.x + offset[0], 3), y: round(before.y + offset[1], 3), height: before.height }));
  });

  /** Arrow keys move the selected rod; the move is saved once the keys rest for a moment. */
  function nudgeByKey(event) {
    const step = arrowStep(event);
    const rod = rodById(selectedId);
    if (!step || !rod) {
      return;
    }
    event.preventDefault();
    const before = rodNudge.pending && rodNudge.pending.key === rod.id ? rodNudge.pending.before : snapshot(rod);
    const offset = rodNudge.step(rod.id, before, step);
    const x = round(before.x + offset[0], 3);
    const y = round(before.y + offset[1], 3);
    const circle = rodCircle(rod.id);
    if (circle) {
      const q = toDrawing(x, y);
      circle.setAttribute('cx', String(q.x));
      circle.setAttribute('cy', String(q.y));
    }
    rodForm.elements.x.value = String(x);
    rodForm.elements.y.value = String(y);
  }

  // ---- start ----

  edits.enqueue(async () => {
    try {
      setParts(await call('GET', '/parts'));
      bindDrawing();
      root.hidden = false;
    } catch (error) {
      report(error);
    }
  });
}

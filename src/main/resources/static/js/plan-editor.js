// Plan editor: places, moves and removes air-termination rods on the plan page through the JSON
// API, swapping in the new drawing and summary after each change. Without this module the page
// stays a read-only plan. All words come from data attributes the server renders from messages.

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
  let conductors = [];
  let drawingConductor = false;
  let conductorPoints = [];

  let version = Number(root.dataset.version);
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
      throw new ApiError(response.status, data.error || String(response.status));
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
    }
  }

  /** A whole number when it is one, else one decimal, as the server writes the summary. */
  function formatNumber(value) {
    const rounded = Math.round(value * 10) / 10;
    return Number.isInteger(rounded) ? String(rounded) : rounded.toFixed(1);
  }

  function setParts(parts) {
    conductors = parts.conductors || [];
    const keepConductor = conductorSelect.options[0];
    const chosen = conductorSelect.value;
    conductorSelect.replaceChildren(keepConductor);
    for (const c of conductors) {
      conductorSelect.add(new Option(text('RodOption').replace('{0}', c.name).replace('{1}', c.id), c.id));
    }
    conductorSelect.value = conductors.some((c) => c.id === chosen) ? chosen : '';
    deleteConductor.disabled = conductorSelect.value === '';
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

  function rodCircle(id) {
    return Array.from(drawing.querySelectorAll('circle.rod')).find((c) => c.dataset.rodId === id) || null;
  }

  function rodById(id) {
    return rods.find((rod) => rod.id === id) || null;
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

  conductorSelect.addEventListener('change', () => {
    deleteConductor.disabled = conductorSelect.value === '';
  });

  deleteConductor.addEventListener('click', () => {
    const c = conductors.find((item) => item.id === conductorSelect.value);
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
          const local = toLocal(q);
          conductorPoints.push([round(local.x, 2), round(local.y, 2)]);
          conductorForm.elements.count.value = String(conductorPoints.length);
          conductorPreview();
        }
        return;
      }
      if (!placing || event.target.closest('circle.rod')) {
        return;
      }
      const p = svgPoint(event);
      if (p.y > frame().drawHeight) {
        return;
      }
      const local = toLocal(p);
      newForm.elements.x.value = String(round(local.x, 2));
      newForm.elements.y.value = String(round(local.y, 2));
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
    select(selectedId);
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
      const local = toLocal(svgPoint(e));
      perform(changeCommand(id, snapshot(rod), { x: round(local.x, 2), y: round(local.y, 2), height: rod.height }));
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

// Drawing a section cut on the plan: after "Draw the cut on the plan", the first click on the
// drawing sets the start, the second the end; both fill the cut form (local metres) and a line
// shows the cut. The form is then sent as usual. Without this module the numbers are typed in.
// Drawing the cut is one of the plan's tools: choosing it ends placing a rod or drawing a conductor.

import { eventPoint, frameOf, toLocal as frameToLocal } from './plan-frame.js';
import { planTools } from './tools.js';

const SVG_NS = 'http://www.w3.org/2000/svg';

function setUp(form, button) {
  const drawing = document.getElementById('plan-drawing');
  if (!drawing) {
    button.hidden = true;
    return;
  }
  let start = null;

  function svg() {
    return drawing.querySelector('svg');
  }

  function toLocal(event) {
    const p = eventPoint(svg(), event);
    const local = frameToLocal(frameOf(svg()), p);
    return { sx: p.x, sy: p.y, x: local.x, y: local.y };
  }

  function line() {
    let element = svg().querySelector('line.cut-line');
    if (!element) {
      element = document.createElementNS(SVG_NS, 'line');
      element.setAttribute('class', 'cut-line');
      svg().appendChild(element);
    }
    return element;
  }

  function showActive(on) {
    start = null;
    button.setAttribute('aria-pressed', on ? 'true' : 'false');
    drawing.classList.toggle('cutting', on);
  }

  planTools.register('cut', { activate: () => showActive(true), deactivate: () => showActive(false) });
  button.addEventListener('click', () => planTools.toggle('cut'));

  // capture phase: while a cut is drawn, clicks on the plan belong to the cut, not to the rod editor
  drawing.addEventListener('click', (event) => {
    if (!planTools.isActive('cut') || !svg()) {
      return;
    }
    event.stopPropagation();
    event.preventDefault();
    const p = toLocal(event);
    const fields = form.elements;
    const cut = line();
    if (start === null) {
      start = p;
      fields.x1.value = p.x.toFixed(1);
      fields.y1.value = p.y.toFixed(1);
      cut.setAttribute('x1', p.sx);
      cut.setAttribute('y1', p.sy);
      cut.setAttribute('x2', p.sx);
      cut.setAttribute('y2', p.sy);
      return;
    }
    fields.x2.value = p.x.toFixed(1);
    fields.y2.value = p.y.toFixed(1);
    cut.setAttribute('x2', p.sx);
    cut.setAttribute('y2', p.sy);
    planTools.end('cut');
    form.querySelector('button[type="submit"]').focus();
  }, true);
}

const form = document.getElementById('section-form');
const button = document.getElementById('draw-cut');
if (form && button) {
  setUp(form, button);
}

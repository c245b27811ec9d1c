// Collection area layer on the plan page: a checkbox draws the risk estimate's collection area A_D
// (rings in local metres, from the checkbox's data-zone; its fill and outline as the plan's renderer
// draws the layer, from data-style) under the structures of the plan, in the plan's own frame
// (data-origin-x, data-origin-y, data-scale, data-margin of the <svg>). The zone
// often reaches beyond the drawn site: the view is widened to hold it and the legend moved below
// it, up to MAX_WIDENING; a larger zone (a tall building) is clipped to the drawing with a note. The layer is drawn again when the plan is replaced after an edit. Without this module
// the checkbox stays hidden.

import { frameOf, toDrawing } from './plan-frame.js';

const SVG_NS = 'http://www.w3.org/2000/svg';
const LAYER = 'collection-area-layer';
const PAD = 12;
const CLIP_ID = 'collection-area-clip';
// the view may grow to this multiple of its width or height; a larger zone is clipped instead
const MAX_WIDENING = 1.6;

function setUp(toggle) {
  const drawing = document.getElementById('plan-drawing');
  if (!drawing) {
    return;
  }
  const rings = JSON.parse(toggle.dataset.zone || '[]');
  const style = JSON.parse(toggle.dataset.style || '{}');
  if (rings.length === 0) {
    return;
  }
  document.getElementById('collection-area-control').hidden = false;
  const clippedNote = document.getElementById('collection-area-clipped');

  function draw(svg) {
    if (svg.querySelector('.' + LAYER)) {
      return;
    }
    const f = frameOf(svg);
    if (!svg.dataset.viewBoxPlain) {
      svg.dataset.viewBoxPlain = svg.getAttribute('viewBox');
      svg.dataset.heightPlain = svg.getAttribute('height');
    }
    let d = '';
    let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
    for (const ring of rings) {
      ring.forEach(([x, y], i) => {
        const { x: sx, y: sy } = toDrawing(f, x, y);
        minX = Math.min(minX, sx); maxX = Math.max(maxX, sx);
        minY = Math.min(minY, sy); maxY = Math.max(maxY, sy);
        d += (i === 0 ? 'M' : 'L') + sx.toFixed(2) + ' ' + sy.toFixed(2);
      });
      d += 'Z';
    }
    const path = document.createElementNS(SVG_NS, 'path');
    path.setAttribute('class', LAYER);
    path.setAttribute('d', d);
    for (const [name, value] of Object.entries(style)) {
      path.setAttribute(name, value);
    }
    path.setAttribute('fill-rule', 'evenodd');
    const title = document.createElementNS(SVG_NS, 'title');
    title.textContent = toggle.dataset.title;
    path.appendChild(title);
    // over the protected ground (opaque) and under the exposed areas, edges and parts, which stay on top
    const grounds = svg.querySelectorAll('path.protected-ground');
    const below = grounds.length > 0 ? grounds[grounds.length - 1] : svg.querySelector('rect.plan-background');
    svg.insertBefore(path, below ? below.nextSibling : svg.firstChild);

    const [vx, vy, vw, vh] = svg.dataset.viewBoxPlain.split(/\s+/).map(Number);
    const overhang = Math.max(0, maxY + PAD - f.drawHeight);
    const left = Math.min(vx, minX - PAD);
    const top = Math.min(vy, minY - PAD);
    const right = Math.max(vx + vw, maxX + PAD);
    const bottom = vy + vh + overhang;
    const width = right - left;
    const height = bottom - top;
    if (width > MAX_WIDENING * vw || height > MAX_WIDENING * vh) {
      // widening this far would shrink the site and the legend beyond reading: keep the view, clip
      // the zone to the drawing area and say that it goes on (the risk page draws all of it)
      clipToDrawing(svg, path, vw, f.drawHeight);
      clippedNote.hidden = false;
      return;
    }
    const legend = svg.querySelector('g.legend');
    if (legend && overhang > 0) {
      legend.setAttribute('transform', 'translate(0 ' + overhang.toFixed(1) + ')');
    }
    svg.setAttribute('viewBox', [left, top, width, height].map((v) => v.toFixed(1)).join(' '));
    svg.setAttribute('height', (Number(svg.getAttribute('width')) * height / width).toFixed(0));
    // the drawing's background grows with the view, down to where the legend now starts
    const background = svg.querySelector('rect.plan-background');
    if (background) {
      background.dataset.plain = ['x', 'y', 'width', 'height'].map((a) => background.getAttribute(a)).join(' ');
      setBox(background, [left, top, width, f.drawHeight + overhang - top]);
    }
  }

  function clipToDrawing(svg, path, width, drawHeight) {
    const clip = document.createElementNS(SVG_NS, 'clipPath');
    clip.setAttribute('id', CLIP_ID);
    clip.setAttribute('class', LAYER);
    const box = document.createElementNS(SVG_NS, 'rect');
    setBox(box, [0, 0, width, drawHeight]);
    clip.appendChild(box);
    svg.insertBefore(clip, svg.firstChild);
    path.setAttribute('clip-path', 'url(#' + CLIP_ID + ')');
  }

  function remove(svg) {
    svg.querySelectorAll('.' + LAYER).forEach((element) => element.remove());
    clippedNote.hidden = true;
    if (svg.dataset.viewBoxPlain) {
      svg.setAttribute('viewBox', svg.dataset.viewBoxPlain);
      svg.setAttribute('height', svg.dataset.heightPlain);
    }
    const legend = svg.querySelector('g.legend');
    if (legend) {
      legend.removeAttribute('transform');
    }
    const background = svg.querySelector('rect.plan-background');
    if (background && background.dataset.plain) {
      setBox(background, background.dataset.plain.split(' ').map(Number));
      delete background.dataset.plain;
    }
  }

  function setBox(rect, [x, y, width, height]) {
    rect.setAttribute('x', x.toFixed(1));
    rect.setAttribute('y', y.toFixed(1));
    rect.setAttribute('width', width.toFixed(1));
    rect.setAttribute('height', height.toFixed(1));
  }

  function update() {
    const svg = drawing.querySelector('svg.plan');
    if (!svg) {
      return;
    }
    if (toggle.checked) {
      draw(svg);
    } else {
      remove(svg);
    }
  }

  toggle.addEventListener('change', update);
  // the plan editor replaces the drawing after each change: draw the layer again if it is on
  new MutationObserver(() => {
    if (toggle.checked) {
      update();
    }
  }).observe(drawing, { childList: true });
  update();
}

const toggle = document.getElementById('collection-area-toggle');
if (toggle) {
  setUp(toggle);
}

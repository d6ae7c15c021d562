// The picture: an SVG in pixel space holding axes, a legend and a nested SVG in world space (metres, y up
// drawn as SVG y = −y) whose viewBox zooms and pans. Layers are filled by section-view.js and field-view.js.

import { svg, clear } from './dom.js';
import { PICTURE_STYLE } from './picture-style.js';
import { niceTicks } from './ticks.js';

const MARGIN = { left: 48, right: 116, top: 8, bottom: 34 };
const LAYERS = ['fill', 'mesh', 'outline', 'equipotentials', 'flowlines', 'features'];
const OVERLAYS = ['contourLabels', 'labels'];

export class Picture {
  constructor(box) {
    this.box = box;
    this.root = svg('svg', { xmlns: 'http://www.w3.org/2000/svg', role: 'img', id: 'picture',
      'aria-label': 'Section picture. Keys: plus and minus zoom, 0 fits the structure, a shows all, arrows pan.' });
    this.root.append(svg('style', {}, PICTURE_STYLE));
    this.world = svg('svg', { class: 'world', preserveAspectRatio: 'xMidYMid meet', overflow: 'hidden' });
    this.hatch = concreteHatch();
    this.world.append(this.hatch);
    this.layers = {};
    for (const name of LAYERS) {
      const g = svg('g', { class: name, 'data-layer': name });
      this.layers[name] = g;
      this.world.append(g);
    }
    // Labels live in pixel space (projected on every view change): browsers clamp tiny font sizes, so text
    // in metre units would not scale correctly.
    this.clipRect = svg('rect');
    this.overlay = svg('g', { class: 'overlay', 'clip-path': 'url(#world-clip)', 'pointer-events': 'none' });
    for (const name of OVERLAYS) {
      const g = svg('g', { class: `labels ${name}`, 'data-layer': name });
      this.layers[name] = g;
      this.overlay.append(g);
    }
    this.axes = svg('g', { class: 'axes' });
    this.legend = svg('g', { class: 'legend' });
    this.root.append(svg('defs', {}, svg('clipPath', { id: 'world-clip' }, this.clipRect)), this.world, this.overlay, this.axes, this.legend);
    box.append(this.root);
    this.bounds = { minX: -1, maxX: 1, minY: -1, maxY: 1 };
    this.view = null;
    this.listeners = [];
    this.resizeListeners = [];
    this.wireInput();
    new ResizeObserver(() => {
      const before = this.size?.width;
      this.layout();
      if (this.size.width !== before) for (const fn of this.resizeListeners) fn();
    }).observe(box);
  }

  /** Registers fn(scale) called after every zoom, pan or resize; scale is pixels per metre. */
  onView(fn) { this.listeners.push(fn); }

  /** Registers fn(pointer) called when a drawn member with a JSON pointer (a cutoff, a head line) is clicked. */
  onPick(fn) { this.pickListeners = [...(this.pickListeners ?? []), fn]; }

  /** Registers fn() called after the picture changed size (the caller redraws size-dependent parts). */
  onResize(fn) { this.resizeListeners.push(fn); }

  /** Sets the world extent in metres and fits the view to it. */
  setBounds(bounds) {
    this.bounds = bounds;
    this.layout(true);
  }

  clearLayers() {
    for (const g of Object.values(this.layers)) clear(g);
    clear(this.legend);
  }

  layout(refit = false) {
    const width = Math.max(320, this.box.clientWidth);
    const b = this.bounds;
    const aspect = (b.maxY - b.minY) / Math.max(1e-9, b.maxX - b.minX);
    const innerW = width - MARGIN.left - MARGIN.right;
    // Tall enough for the section, short enough that the figures beside and the caption below stay on screen.
    const cap = Math.max(260, Math.min(560, (window.innerHeight || 900) - 340));
    const innerH = Math.min(cap, Math.max(260, innerW * aspect * 1.15));
    const height = innerH + MARGIN.top + MARGIN.bottom;
    this.size = { width, height, innerW, innerH };
    for (const [k, v] of Object.entries({ width, height, viewBox: `0 0 ${width} ${height}` })) this.root.setAttribute(k, v);
    for (const [k, v] of Object.entries({ x: MARGIN.left, y: MARGIN.top, width: innerW, height: innerH })) {
      this.world.setAttribute(k, v);
      this.clipRect.setAttribute(k, v);
    }
    this.legend.setAttribute('transform', `translate(${width - MARGIN.right + 14}, ${MARGIN.top + 4})`);
    if (refit || !this.view) this.fit();
    else this.applyView();
  }

  /** Sets the region "Fit" frames (metres; the structure and where the head changes); null frames everything. */
  setFocus(focus) {
    this.focus = focus;
    this.fit();
  }

  /** Frames the focus region (or the whole section when there is none). */
  fit() { this.frame(this.focus ?? this.bounds); }

  /** Shows the whole section with a small margin. */
  fitAll() { this.frame(this.bounds); }

  frame(b) {
    const { innerW, innerH } = this.size;
    let w = (b.maxX - b.minX) * 1.04;
    let h = (b.maxY - b.minY) * 1.08;
    const cx = (b.minX + b.maxX) / 2;
    const cy = -(b.minY + b.maxY) / 2;
    if (w / h < innerW / innerH) w = h * innerW / innerH; else h = w * innerH / innerW;
    this.view = { x: cx - w / 2, y: cy - h / 2, w, h };
    this.applyView();
  }

  /** Zooms by `factor` (< 1 zooms in) about a point in SVG world coordinates (default: the centre). */
  zoom(factor, about) {
    const v = this.view;
    const p = about ?? { x: v.x + v.w / 2, y: v.y + v.h / 2 };
    const span = (this.bounds.maxX - this.bounds.minX) * 4;
    if (v.w * factor > span || v.w * factor < span * 1e-4) return;
    this.view = { x: p.x - (p.x - v.x) * factor, y: p.y - (p.y - v.y) * factor, w: v.w * factor, h: v.h * factor };
    this.applyView();
  }

  /** Pixels per metre at the current zoom. */
  get scale() { return Math.min(this.size.innerW / this.view.w, this.size.innerH / this.view.h); }

  applyView() {
    const v = this.view;
    this.world.setAttribute('viewBox', `${v.x} ${v.y} ${v.w} ${v.h}`);
    const s = this.scale;
    this.projectLabels();
    this.hatch.firstChild.setAttribute('patternTransform', `scale(${1 / s}) rotate(45)`);
    for (const el of this.world.querySelectorAll('[data-px-r]')) el.setAttribute('r', Number(el.dataset.pxR) / s);
    this.drawAxes();
    for (const fn of this.listeners) fn(s);
  }

  /** Moves every overlay label to the pixel position of its world anchor (x, y attributes as first drawn). */
  projectLabels() {
    const vis = this.visible();
    const s = this.scale;
    for (const t of this.overlay.querySelectorAll('text')) {
      if (t.dataset.wx === undefined) { t.dataset.wx = t.getAttribute('x'); t.dataset.wy = t.getAttribute('y'); }
      t.setAttribute('x', (MARGIN.left + (Number(t.dataset.wx) - vis.x) * s).toFixed(1));
      t.setAttribute('y', (MARGIN.top + (Number(t.dataset.wy) - vis.y) * s).toFixed(1));
    }
    this.hideCollidingLabels();
  }

  /** Feature labels win over contour labels; a label that would overlap one already shown is hidden. */
  hideCollidingLabels() {
    const shown = [];
    const texts = [...this.layers.labels.querySelectorAll('text'), ...this.layers.contourLabels.querySelectorAll('text')];
    for (const t of texts) {
      t.removeAttribute('visibility');
      let box;
      try { box = t.getBBox(); } catch { continue; }
      if (box.width === 0) continue;
      const hit = shown.some(b => box.x < b.x + b.width + 2 && b.x < box.x + box.width + 2 && box.y < b.y + b.height && b.y < box.y + box.height);
      if (hit) t.setAttribute('visibility', 'hidden');
      else shown.push(box);
    }
  }

  /** World point (metres, y up) under a mouse event, or null outside the world area. */
  worldAt(event) {
    const ctm = this.layers.fill.getScreenCTM();
    if (!ctm) return null;
    const p = new DOMPoint(event.clientX, event.clientY).matrixTransform(ctm.inverse());
    return { x: p.x, y: -p.y };
  }

  /** The visible world rectangle in SVG coordinates (includes the letterbox of "meet"). */
  visible() {
    const s = this.scale;
    const v = this.view;
    const w = this.size.innerW / s, h = this.size.innerH / s;
    return { x: v.x + v.w / 2 - w / 2, y: v.y + v.h / 2 - h / 2, w, h };
  }

  drawAxes() {
    clear(this.axes);
    const { innerW, innerH } = this.size;
    const vis = this.visible();
    const s = this.scale;
    const g = this.axes;
    g.append(svg('rect', { class: 'frame', x: MARGIN.left, y: MARGIN.top, width: innerW, height: innerH }));
    for (const x of niceTicks(vis.x, vis.x + vis.w, Math.max(4, Math.floor(innerW / 70)))) {
      const px = MARGIN.left + (x - vis.x) * s;
      g.append(svg('g', { class: 'tick' },
        svg('line', { x1: px, x2: px, y1: MARGIN.top + innerH, y2: MARGIN.top + innerH + 4 }),
        svg('text', { x: px, y: MARGIN.top + innerH + 15, 'text-anchor': 'middle' }, label(x))));
    }
    for (const y of niceTicks(-(vis.y + vis.h), -vis.y, Math.max(3, Math.floor(innerH / 50)))) {
      const py = MARGIN.top + (-y - vis.y) * s;
      g.append(svg('g', { class: 'tick' },
        svg('line', { x1: MARGIN.left - 4, x2: MARGIN.left, y1: py, y2: py }),
        svg('text', { x: MARGIN.left - 6, y: py + 4, 'text-anchor': 'end' }, label(y))));
    }
    g.append(svg('text', { class: 'axis-title', x: MARGIN.left + innerW / 2, y: MARGIN.top + innerH + 30, 'text-anchor': 'middle' }, 'x (m)'));
    g.append(svg('text', { class: 'axis-title', x: 12, y: MARGIN.top + innerH / 2, transform: `rotate(-90 12 ${MARGIN.top + innerH / 2})`, 'text-anchor': 'middle' }, 'elevation y (m)'));
  }

  wireInput() {
    // Keyboard: + and − zoom, 0 fits, arrow keys pan by a tenth of the view.
    this.root.setAttribute('tabindex', '0');
    this.root.addEventListener('keydown', e => {
      const v = this.view;
      const pan = { ArrowLeft: [-0.1, 0], ArrowRight: [0.1, 0], ArrowUp: [0, -0.1], ArrowDown: [0, 0.1] }[e.key];
      if (e.key === '+' || e.key === '=') this.zoom(1 / 1.25);
      else if (e.key === '-' || e.key === '_') this.zoom(1.25);
      else if (e.key === '0') this.fit();
      else if (e.key === 'a') this.fitAll();
      else if (pan) { this.view = { ...v, x: v.x + pan[0] * v.w, y: v.y + pan[1] * v.h }; this.applyView(); }
      else return;
      e.preventDefault();
    });
    this.root.addEventListener('wheel', e => {
      e.preventDefault();
      const ctm = this.layers.fill.getScreenCTM();
      const p = new DOMPoint(e.clientX, e.clientY).matrixTransform(ctm.inverse());
      this.zoom(e.deltaY > 0 ? 1.15 : 1 / 1.15, { x: p.x, y: p.y });
    }, { passive: false });
    let drag = null;
    this.root.addEventListener('pointerdown', e => {
      if (e.button !== 0) return;
      const picked = e.target.closest?.('[data-pointer]')?.getAttribute('data-pointer');
      drag = { x: e.clientX, y: e.clientY, view: { ...this.view }, picked };
      this.root.setPointerCapture(e.pointerId);
      this.root.classList.add('panning');
    });
    this.root.addEventListener('pointermove', e => {
      if (!drag) return;
      const s = this.scale;
      this.view = { ...drag.view, x: drag.view.x - (e.clientX - drag.x) / s, y: drag.view.y - (e.clientY - drag.y) / s };
      this.applyView();
    });
    const end = () => { drag = null; this.root.classList.remove('panning'); };
    this.root.addEventListener('pointerup', e => {
      // A click (no drag) on a member selects it in the form.
      if (drag?.picked && Math.hypot(e.clientX - drag.x, e.clientY - drag.y) < 5)
        for (const fn of this.pickListeners ?? []) fn(drag.picked);
      end();
    });
    this.root.addEventListener('pointercancel', end);
  }

  /** A standalone copy of the picture for download (explicit size, current view). */
  exportClone() {
    const copy = this.root.cloneNode(true);
    copy.removeAttribute('id');
    copy.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
    return copy;
  }
}

function label(v) {
  const r = Math.round(v * 1000) / 1000;
  return String(r).replace('-', '−');
}

function concreteHatch() {
  return svg('defs', {},
    svg('pattern', { id: 'concrete', width: 8, height: 8, patternUnits: 'userSpaceOnUse', patternTransform: 'rotate(45)' },
      svg('rect', { width: 8, height: 8, fill: '#c9c4b8' }),
      svg('line', { x1: 0, y1: 0, x2: 0, y2: 8, stroke: '#8f897d', 'stroke-width': 1.2 })));
}

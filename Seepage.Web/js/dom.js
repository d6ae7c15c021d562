// Small DOM helpers shared by the page modules.

export const SVG_NS = 'http://www.w3.org/2000/svg';

/** Creates an HTML element with attributes and children (strings become text nodes). */
export function html(tag, attrs = {}, ...children) {
  const el = document.createElement(tag);
  setAttrs(el, attrs);
  append(el, children);
  return el;
}

/** Creates an SVG element with attributes and children. */
export function svg(tag, attrs = {}, ...children) {
  const el = document.createElementNS(SVG_NS, tag);
  setAttrs(el, attrs);
  append(el, children);
  return el;
}

function setAttrs(el, attrs) {
  for (const [key, value] of Object.entries(attrs)) {
    if (value === undefined || value === null || value === false) continue;
    if (key === 'text') el.textContent = value;
    else if (key.startsWith('on') && typeof value === 'function') el.addEventListener(key.slice(2), value);
    else el.setAttribute(key, value === true ? '' : String(value));
  }
}

function append(el, children) {
  for (const child of children.flat()) {
    if (child === undefined || child === null || child === false) continue;
    el.append(child instanceof Node ? child : document.createTextNode(String(child)));
  }
}

/** Removes all children of an element. */
export function clear(el) {
  while (el.firstChild) el.removeChild(el.firstChild);
  return el;
}

/** Shortcut for getElementById that fails loudly when the page and the code disagree. */
export function byId(id) {
  const el = document.getElementById(id);
  if (!el) throw new Error(`page element #${id} is missing`);
  return el;
}

/** SVG path data of a polyline of [x, y] points in metres, drawn with y up (SVG y = −y). */
export function pathData(points, close = false) {
  if (!points || points.length === 0) return '';
  let d = '';
  for (let i = 0; i < points.length; i++) {
    const p = points[i];
    d += (i === 0 ? 'M' : 'L') + round(p[0]) + ' ' + round(-p[1]);
  }
  return close ? d + 'Z' : d;
}

/** Rounds a coordinate to keep path strings short (1 mm at metre scale). */
export function round(v) {
  return Math.round(v * 1000) / 1000;
}

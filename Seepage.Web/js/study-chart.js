// Bar chart of one figure over the alternatives of a study, with the required value as a line for the factors.

import { svg } from './dom.js';
import { sig, fixed } from './format.js';
import { niceTicks } from './ticks.js';

const SUPER = { '-': '⁻', 0: '⁰', 1: '¹', 2: '²', 3: '³', 4: '⁴', 5: '⁵', 6: '⁶', 7: '⁷', 8: '⁸', 9: '⁹' };
const W = 440, H = 220, M = { left: 58, right: 10, top: 12, bottom: 56 };
const STYLE = `text { font-family: "DejaVu Sans", system-ui, sans-serif; font-size: 10px; fill: #333; }
.bar { fill: #5b8ac2; } .bar.fail { fill: #c9655d; } .grid { stroke: #e6e2d8; } .axis { fill: none; stroke: #77726a; }
.limit { stroke: #b3261e; stroke-width: 1.5; stroke-dasharray: 6 4; }`;

export const CHART_FIGURES = {
  flow: { label: 'flow (m³/s per m)', required: null },
  upliftForce: { label: 'uplift force (kN/m)', required: null },
  exitFactor: { label: 'exit factor (piping)', required: 'exitRequiredFactor' },
  heaveFactor: { label: 'heave factor (smallest)', required: 'heaveRequiredFactor' },
};

/** The chart of `figure` (a key of CHART_FIGURES) over the study rows. */
export function studyChart(rows, figure) {
  const spec = CHART_FIGURES[figure];
  const values = rows.map(r => r[figure]);
  const required = spec.required ? rows.map(r => r[spec.required]).find(Number.isFinite) : null;
  const finite = [...values, required].filter(Number.isFinite);
  const hi = Math.max(0, ...finite) * 1.1 || 1;
  const iw = W - M.left - M.right, ih = H - M.top - M.bottom;
  const sy = v => M.top + ih - (v / hi) * ih;
  // Very small or large figures (flows of 10⁻⁴ m³/s per m) are labelled in units of a power of ten.
  const power = Math.floor(Math.log10(hi));
  const scale = power < -2 || power > 4 ? Math.pow(10, power) : 1;
  const unitNote = scale === 1 ? '' : ` × 10${String(power).split('').map(c => SUPER[c]).join('')}`;
  const root = svg('svg', { xmlns: 'http://www.w3.org/2000/svg', viewBox: `0 0 ${W} ${H}`, role: 'img', id: 'study-chart',
    'aria-label': `${spec.label} of each alternative` }, svg('style', {}, STYLE));
  for (const t of niceTicks(0, hi, 5)) {
    root.append(svg('line', { class: 'grid', x1: M.left, x2: M.left + iw, y1: sy(t), y2: sy(t) }),
      svg('text', { x: M.left - 4, y: sy(t) + 3, 'text-anchor': 'end' }, sig(t / scale, 3)));
  }
  const band = iw / Math.max(1, rows.length);
  rows.forEach((r, i) => {
    const x = M.left + i * band + band * 0.15;
    const v = values[i];
    if (Number.isFinite(v))
      root.append(svg('rect', { class: `bar${r.pass === false ? ' fail' : ''}`, x, y: sy(v), width: band * 0.7, height: sy(0) - sy(v) },
        svg('title', {}, `${r.name}: ${sig(v, 4)}`)));
    root.append(svg('text', { x: x + band * 0.35, y: M.top + ih + 12, 'text-anchor': 'end',
      transform: `rotate(-30 ${x + band * 0.35} ${M.top + ih + 12})` }, r.name.length > 18 ? r.name.slice(0, 17) + '…' : r.name));
  });
  if (Number.isFinite(required)) {
    root.append(svg('line', { class: 'limit', x1: M.left, x2: M.left + iw, y1: sy(required), y2: sy(required) }),
      svg('text', { x: M.left + iw - 2, y: sy(required) - 4, 'text-anchor': 'end', fill: '#b3261e' }, `required ${fixed(required, 2)}`));
  }
  root.append(svg('rect', { class: 'axis', x: M.left, y: M.top, width: iw, height: ih }),
    svg('text', { x: 12, y: M.top + ih / 2, transform: `rotate(-90 12 ${M.top + ih / 2})`, 'text-anchor': 'middle' }, spec.label + unitNote));
  return root;
}

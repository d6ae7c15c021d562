// Station plots drawn from the result document: the uplift pressure diagram under each structure and the
// exit gradient profile with the allowable line.

import { svg, html } from './dom.js';
import { fixed, sig } from './format.js';
import { niceTicks } from './ticks.js';

const W = 480, H = 250, M = { left: 56, right: 14, top: 14, bottom: 40 };

const PLOT_STYLE = `
text { font-family: "DejaVu Sans", system-ui, sans-serif; font-size: 11px; fill: #333; }
.grid { stroke: #e6e2d8; } .axis { stroke: #77726a; fill: none; }
.area { fill: #9ec3e6; fill-opacity: 0.55; stroke: none; }
.series { fill: none; stroke: #1f5fa8; stroke-width: 2; }
.limit { stroke: #b3261e; stroke-width: 1.5; stroke-dasharray: 6 4; }
.limit-label { fill: #b3261e; }
.resultant { stroke: #111; stroke-width: 2; marker-end: url(#arrow); }
.marker { fill: #d0407f; stroke: #fff; stroke-width: 1.5; }
`;

/** Uplift pressure diagram (pressure in kPa drawn downward from the base) with the resultant. */
export function upliftPlot(uplift) {
  const pts = uplift.stations.map(s => [s.x, s.pressure]);
  const plot = frame(`Uplift under ${uplift.structure}`, 'station x (m)', 'pore pressure u (kPa)', pts, { invertY: true, includeZero: true });
  const { g, sx, sy } = plot;
  g.append(svg('path', { class: 'area', d: area(pts, sx, sy) }), svg('path', { class: 'series', d: line(pts, sx, sy) }));
  const peak = Math.max(...pts.map(p => p[1]));
  const x = sx(uplift.centroidX);
  g.append(svg('line', { class: 'resultant', x1: x, x2: x, y1: sy(peak * 1.0), y2: sy(0) + 2, 'data-role': 'resultant' }));
  g.append(svg('text', { x: x + 6, y: sy(peak * 0.55), 'text-anchor': x > W * 0.6 ? 'end' : 'start', dx: x > W * 0.6 ? -12 : 0 },
    `U = ${sig(uplift.force, 4)} kN/m at x = ${fixed(uplift.centroidX, 2)} m`));
  return plot.el;
}

/** Exit gradient along the exit surface with the allowable gradient i_c / F_required. */
export function exitPlot(exit) {
  const pts = (exit.profile ?? []).map(p => [p.x, p.gradient]);
  // The allowable gradient i_c / F is computed by the server (exit.allowableGradient).
  const hasLimit = Number.isFinite(exit.allowableGradient);
  const allowable = hasLimit ? exit.allowableGradient : null;
  const extent = hasLimit ? [...pts, [pts[0]?.[0] ?? 0, allowable * 1.1]] : pts;
  const plot = frame('Exit gradient along the exit surface', 'x (m)', 'upward gradient i (–)', extent, { includeZero: true });
  const { g, sx, sy } = plot;
  g.append(svg('path', { class: 'series', d: line(pts, sx, sy) }));
  if (hasLimit) {
    g.append(svg('line', { class: 'limit', x1: M.left, x2: W - M.right, y1: sy(allowable), y2: sy(allowable) }));
    g.append(svg('text', { class: 'limit-label', x: W - M.right - 4, y: sy(allowable) - 5, 'text-anchor': 'end' },
      `allowable i = ${fixed(allowable, 3)} (i_c ${fixed(exit.criticalGradient, 3)} / F ${fixed(exit.requiredFactor, 2)})`));
  } else {
    g.append(svg('text', { class: 'limit-label', x: W - M.right - 4, y: M.top + 14, 'text-anchor': 'end' }, 'no allowable line: the exit soil has no Gs and e'));
  }
  if (Array.isArray(exit.at)) {
    g.append(svg('circle', { class: 'marker', cx: sx(exit.at[0]), cy: sy(exit.maxGradient), r: 5 }));
    g.append(svg('text', { x: sx(exit.at[0]) + 8, y: sy(exit.maxGradient) + 12 }, `max ${fixed(exit.maxGradient, 3)}`));
  }
  return plot.el;
}

function frame(title, xLabel, yLabel, pts, { invertY = false, includeZero = false } = {}) {
  const xs = pts.map(p => p[0]), ys = pts.map(p => p[1]);
  let y0 = Math.min(...ys), y1 = Math.max(...ys);
  if (includeZero) { y0 = Math.min(0, y0); y1 = Math.max(0, y1); }
  if (y1 - y0 < 1e-12) y1 = y0 + 1;
  y1 += (y1 - y0) * 0.08;
  const x0 = Math.min(...xs), x1 = Math.max(...xs) > x0 ? Math.max(...xs) : x0 + 1;
  const iw = W - M.left - M.right, ih = H - M.top - M.bottom;
  const sx = x => M.left + ((x - x0) / (x1 - x0)) * iw;
  const sy = y => (invertY ? M.top + ((y - y0) / (y1 - y0)) * ih : M.top + ih - ((y - y0) / (y1 - y0)) * ih);
  const root = svg('svg', { xmlns: 'http://www.w3.org/2000/svg', viewBox: `0 0 ${W} ${H}`, role: 'img', 'aria-label': title },
    svg('style', {}, PLOT_STYLE),
    svg('defs', {}, svg('marker', { id: 'arrow', viewBox: '0 0 10 10', refX: 9, refY: 5, markerWidth: 7, markerHeight: 7, orient: 'auto-start-reverse' },
      svg('path', { d: 'M0 0L10 5L0 10Z', fill: '#111' }))));
  const g = svg('g');
  for (const t of niceTicks(x0, x1, 6)) {
    g.append(svg('line', { class: 'grid', x1: sx(t), x2: sx(t), y1: M.top, y2: M.top + ih }));
    g.append(svg('text', { x: sx(t), y: M.top + ih + 14, 'text-anchor': 'middle' }, fixed(t, Math.abs(x1 - x0) < 5 ? 1 : 0)));
  }
  for (const t of niceTicks(y0, y1, 5)) {
    g.append(svg('line', { class: 'grid', x1: M.left, x2: M.left + iw, y1: sy(t), y2: sy(t) }));
    g.append(svg('text', { x: M.left - 5, y: sy(t) + 4, 'text-anchor': 'end' }, sig(t, 3)));
  }
  g.append(svg('rect', { class: 'axis', x: M.left, y: M.top, width: iw, height: ih }));
  g.append(svg('text', { x: M.left + iw / 2, y: H - 6, 'text-anchor': 'middle' }, xLabel));
  g.append(svg('text', { x: 12, y: M.top + ih / 2, 'text-anchor': 'middle', transform: `rotate(-90 12 ${M.top + ih / 2})` }, yLabel));
  root.append(g);
  const el = html('figure', { class: 'plot' }, html('h3', {}, title), root);
  return { el, g, sx, sy };
}

function line(pts, sx, sy) {
  return pts.map((p, i) => `${i ? 'L' : 'M'}${sx(p[0]).toFixed(1)} ${sy(p[1]).toFixed(1)}`).join('');
}

function area(pts, sx, sy) {
  if (pts.length === 0) return '';
  return `M${sx(pts[0][0]).toFixed(1)} ${sy(0).toFixed(1)}` + pts.map(p => `L${sx(p[0]).toFixed(1)} ${sy(p[1]).toFixed(1)}`).join('') +
    `L${sx(pts[pts.length - 1][0]).toFixed(1)} ${sy(0).toFixed(1)}Z`;
}

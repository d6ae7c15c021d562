// Draws the server's field data: head colour fill, mesh, equipotentials, flow lines, walls, the exit
// marker and the head legend. Nothing is computed here beyond binning heads into colours.

import { svg, pathData, round } from './dom.js';
import { rampColour, RAMP_STEPS } from './ramp.js';
import { fixed } from './format.js';
import { niceTicks } from './ticks.js';

/** Smallest and largest nodal total head in metres. */
export function headRange(field) {
  let lo = Infinity, hi = -Infinity;
  for (const h of field.heads) { if (h < lo) lo = h; if (h > hi) hi = h; }
  return hi > lo ? { lo, hi } : { lo: lo - 0.5, hi: lo + 0.5 };
}

/** One path per colour step; each triangle takes the colour of its mean nodal head. */
export function drawHeadFill(layer, field, range) {
  const bins = Array.from({ length: RAMP_STEPS }, () => []);
  const { nodes, heads } = field;
  field.triangles.forEach(([a, b, c]) => {
    const mean = (heads[a] + heads[b] + heads[c]) / 3;
    const t = (mean - range.lo) / (range.hi - range.lo);
    const k = Math.min(RAMP_STEPS - 1, Math.max(0, Math.floor(t * RAMP_STEPS)));
    bins[k].push(`M${round(nodes[a][0])} ${round(-nodes[a][1])}L${round(nodes[b][0])} ${round(-nodes[b][1])}L${round(nodes[c][0])} ${round(-nodes[c][1])}Z`);
  });
  const g = svg('g', { class: 'head-fill' });
  bins.forEach((parts, k) => {
    if (parts.length === 0) return;
    const colour = rampColour((k + 0.5) / RAMP_STEPS);
    g.append(svg('path', { d: parts.join(''), fill: colour, stroke: colour }));
  });
  layer.append(g);
}

/** Triangle edges as one path. */
export function drawMesh(layer, field) {
  const { nodes } = field;
  const parts = field.triangles.map(([a, b, c]) =>
    `M${round(nodes[a][0])} ${round(-nodes[a][1])}L${round(nodes[b][0])} ${round(-nodes[b][1])}L${round(nodes[c][0])} ${round(-nodes[c][1])}Z`);
  layer.append(svg('path', { class: 'mesh', d: parts.join('') }));
}

/** Equipotentials at the server's head levels, with a head label on each. */
export function drawEquipotentials(layer, labels, field) {
  for (const eq of field.equipotentials ?? []) {
    for (const path of eq.paths ?? []) {
      if (path.length < 2) continue;
      layer.append(svg('path', { class: 'equipotential-casing', d: pathData(path) }));
      layer.append(svg('path', { class: 'equipotential', d: pathData(path), 'data-head': eq.head },
        svg('title', {}, `equipotential h = ${fixed(eq.head, 2)} m`)));
    }
    const longest = (eq.paths ?? []).reduce((a, b) => (b.length > a.length ? b : a), []);
    if (longest.length >= 2) {
      const p = longest[Math.floor(longest.length / 2)];
      labels.append(svg('text', { x: p[0], y: -p[1], 'text-anchor': 'middle', dy: '0.35em' }, fixed(eq.head, 2)));
    }
  }
}

/** Flow lines (white over a dark casing so they read on every head colour). */
export function drawFlowLines(layer, field) {
  for (const line of field.flowLines ?? []) {
    if ((line.points ?? []).length < 2) continue;
    const d = pathData(line.points);
    layer.append(svg('path', { class: 'flow-line-casing', d }));
    layer.append(svg('path', { class: 'flow-line', d, 'data-fraction': line.fraction },
      svg('title', {}, `flow line, ${fixed(100 * line.fraction, 0)} % of the flow passes above it`)));
  }
}

/** Cutoffs and structure bases as the server meshed them. */
export function drawWalls(layer, field) {
  for (const wall of field.walls ?? []) {
    if (wall.length < 2) continue;
    layer.append(svg('path', { class: 'wall-casing field-wall', d: pathData(wall) }), svg('path', { class: 'wall field-wall', d: pathData(wall) }));
  }
}

/** Marks the point of largest exit gradient. */
export function drawExitMarker(features, labels, exit) {
  if (!exit || !Array.isArray(exit.at) || exit.at.length < 2) return;
  const [x, y] = exit.at;
  features.append(svg('circle', { class: 'exit-marker', cx: x, cy: -y, r: 1, 'data-px-r': 6 },
    svg('title', {}, `largest exit gradient ${fixed(exit.maxGradient, 3)}`)));
  labels.append(svg('text', { x, y: -y, dx: '0.7em', dy: '1.5em', 'text-anchor': 'start', class: 'exit' }, `exit i = ${fixed(exit.maxGradient, 3)}`));
}

/** Vertical colour bar of total head with ticks in metres (pixel space). */
export function drawHeadLegend(legend, range, height) {
  const barH = Math.max(120, height - 60);
  legend.append(svg('text', { x: 0, y: 0 }, 'total head'));
  legend.append(svg('text', { x: 0, y: 13 }, 'h (m)'));
  const top = 22;
  const steps = RAMP_STEPS;
  for (let k = 0; k < steps; k++) {
    const y = top + barH * (1 - (k + 1) / steps);
    legend.append(svg('rect', { x: 0, y: round(y), width: 16, height: round(barH / steps + 0.6), fill: rampColour((k + 0.5) / steps) }));
  }
  legend.append(svg('rect', { x: 0, y: top, width: 16, height: barH, fill: 'none', stroke: '#5c584f' }));
  for (const h of niceTicks(range.lo, range.hi, 6)) {
    const y = top + barH * (1 - (h - range.lo) / (range.hi - range.lo));
    legend.append(svg('line', { x1: 16, x2: 20, y1: y, y2: y, stroke: '#333' }));
    legend.append(svg('text', { x: 23, y: y + 4 }, fixed(h, Math.abs(range.hi - range.lo) < 2 ? 2 : 1)));
  }
}

// Draws a section document (before or after analysis): soil zones, structures, cutoffs, head and drain
// boundaries with their heads, and the exit surface. Only the section's own polygons are used.

import { svg, html, clear, pathData } from './dom.js';
import { sig, fixed } from './format.js';

const SOIL_COLOURS = ['#dccaa0', '#b5c7a0', '#c7b0c4', '#a5c1cf', '#d8b497', '#c2bfae', '#9fb5a8', '#d3c3d9'];

/** Colour of the n-th soil in the section's soil list. */
export function soilColour(index) {
  return SOIL_COLOURS[((index % SOIL_COLOURS.length) + SOIL_COLOURS.length) % SOIL_COLOURS.length];
}

/** World extent of the section in metres (zones, structures and head levels). */
export function sectionBounds(section) {
  const pts = [];
  for (const z of arr(section.zones)) pts.push(...arr(z.outline));
  for (const s of arr(section.structures)) pts.push(...arr(s.base));
  for (const c of arr(section.cutoffs)) { if (isPoint(c.top)) pts.push(c.top); if (isPoint(c.tip)) pts.push(c.tip); }
  for (const h of arr(section.heads)) {
    const along = arr(h.along).filter(isPoint);
    if (along.length && Number.isFinite(h.total)) pts.push([along[0][0], h.total]);
  }
  const good = pts.filter(isPoint);
  if (good.length === 0) return { minX: -10, maxX: 10, minY: -10, maxY: 2 };
  const xs = good.map(p => p[0]), ys = good.map(p => p[1]);
  return { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) };
}

/** Soil zones filled by soil (the picture before analysis, or with head colours off). */
export function drawSoilFill(layer, section) {
  const index = soilIndex(section);
  for (const z of arr(section.zones)) {
    const outline = arr(z.outline).filter(isPoint);
    if (outline.length < 3) continue;
    layer.append(svg('path', { class: 'soil-fill', d: pathData(outline, true), fill: soilColour(index.get(z.soil) ?? -1), 'data-soil': z.soil }));
  }
}

/** Zone outlines, drawn over any fill. */
export function drawZoneOutlines(layer, section) {
  for (const z of arr(section.zones)) {
    const outline = arr(z.outline).filter(isPoint);
    if (outline.length >= 3) layer.append(svg('path', { class: 'zone-outline', d: pathData(outline, true) }));
  }
}

/** Structures, cutoffs, boundaries and the exit surface, with labels. */
export function drawFeatures(features, labels, section, bounds) {
  const span = bounds.maxX - bounds.minX;
  const slab = Math.max(0.5, span * 0.025);
  arr(section.heads).forEach((h, i) => drawHead(features, labels, h, span, `/heads/${i}`, (bounds.minX + bounds.maxX) / 2));
  for (const d of arr(section.drains)) {
    const along = arr(d.along).filter(isPoint);
    if (along.length < 2) continue;
    features.append(svg('path', { class: 'drain', d: pathData(along) }));
    const m = midpoint(along);
    labels.append(text(m[0], m[1], `${d.name ?? 'drain'} (h = y)`, { dy: '1.4em', class: 'water' }));
  }
  const exitAlong = arr(section.exitCheck?.along).filter(isPoint);
  if (exitAlong.length >= 2) features.append(svg('path', { class: 'exit-surface', d: pathData(exitAlong) }));
  for (const [i, s] of arr(section.structures).entries()) {
    const base = arr(s.base).filter(isPoint);
    if (base.length < 2) continue;
    const top = base.map(p => [p[0], p[1] + slab]).reverse();
    features.append(svg('path', { class: 'structure', d: pathData([...base, ...top], true), 'data-pointer': `/structures/${i}` }));
    features.append(svg('path', { class: 'structure-base', d: pathData(base) }));
    const m = midpoint(base);
    labels.append(text(m[0], m[1] + slab, s.name ?? 'structure', { dy: '-0.5em' }));
  }
  for (const [i, c] of arr(section.cutoffs).entries()) {
    if (!isPoint(c.top) || !isPoint(c.tip)) continue;
    const pointer = `/cutoffs/${i}`;
    const line = [c.top, c.tip];
    const length = Math.hypot(c.tip[0] - c.top[0], c.tip[1] - c.top[1]);
    if (c.thickness > 0 && length > 0) {
      // A permeable wall: the strip of its thickness centred on the line from top to tip, at any inclination.
      const nx = -(c.tip[1] - c.top[1]) / length * c.thickness / 2, ny = (c.tip[0] - c.top[0]) / length * c.thickness / 2;
      features.append(svg('path', { class: 'wall-thick', 'data-pointer': pointer, d: pathData([[c.top[0] - nx, c.top[1] - ny], [c.tip[0] - nx, c.tip[1] - ny], [c.tip[0] + nx, c.tip[1] + ny], [c.top[0] + nx, c.top[1] + ny]], true) }));
    } else {
      features.append(svg('path', { class: 'wall-casing', d: pathData(line), 'data-pointer': pointer }),
        svg('path', { class: 'wall', d: pathData(line), 'data-pointer': pointer }, svg('title', {}, `${c.name ?? 'cutoff'}: click to edit`)));
    }
    const depth = Math.hypot(c.top[0] - c.tip[0], c.top[1] - c.tip[1]);
    // Labels of cutoffs left of the middle read leftwards, the others rightwards, so neighbours do not collide.
    const left = c.tip[0] < (bounds.minX + bounds.maxX) / 2;
    labels.append(text(c.tip[0], c.tip[1], `${c.name ?? 'cutoff'} (${fixed(depth, 1)} m)`,
      { dy: '1.2em', dx: left ? '-0.3em' : '0.3em', 'text-anchor': left ? 'end' : 'start' }));
  }
}

function drawHead(features, labels, h, span, pointer, mid) {
  const along = arr(h.along).filter(isPoint);
  if (along.length < 2) return;
  features.append(svg('path', { class: 'head-boundary', d: pathData(along), 'data-pointer': pointer },
    svg('title', {}, `${h.name ?? 'head'}: click to edit`)));
  if (!Number.isFinite(h.total)) return;
  const xs = along.map(p => p[0]);
  const x0 = Math.min(...xs), x1 = Math.max(...xs);
  const level = h.total;
  const topOfBoundary = Math.max(...along.map(p => p[1]));
  if (x1 - x0 > span * 0.01) {
    features.append(svg('path', { class: 'water-level', d: pathData([[x0, level], [x1, level]]), 'data-pointer': pointer }));
    // The label sits at the end nearer the middle of the section (by the structure, where "Fit" looks) and reads
    // outwards, so the two water levels of a structure do not meet.
    const inner = Math.abs(x0 - mid) < Math.abs(x1 - mid) ? x0 : x1;
    const outwards = inner === x0 ? { 'text-anchor': 'start', dx: '0.6em' } : { 'text-anchor': 'end', dx: '-0.6em' };
    labels.append(text(inner, level, `▽ ${h.name ?? 'head'}: h = ${fixed(level, 2)} m`, { dy: '-0.45em', class: 'water', ...outwards }));
  } else {
    const m = midpoint(along);
    labels.append(text(m[0], Math.max(m[1], topOfBoundary), `${h.name ?? 'head'}: h = ${fixed(level, 2)} m`, { dy: '-0.45em', class: 'water' }));
  }
}

/** Fills the soil table: colour, id, kx, ky, bedding angle, unit. */
export function renderSoilLegend(container, section) {
  clear(container);
  const soils = arr(section.soils);
  if (soils.length === 0) { container.append(html('p', { class: 'note' }, 'No soils in the section.')); return; }
  const unit = section.conductivityUnit ?? 'm/s';
  const body = soils.map((s, i) => html('tr', {},
    html('td', {}, html('span', { class: 'swatch', style: `background:${soilColour(i)}` }), String(s.id ?? `soil ${i + 1}`)),
    html('td', { class: 'num' }, sig(s.kx, 3)),
    html('td', { class: 'num' }, sig(s.ky ?? s.kx, 3)),
    html('td', { class: 'num' }, `${fixed(s.beddingAngle ?? 0, 0)}°`)));
  container.append(html('table', {},
    html('thead', {}, html('tr', {}, html('th', {}, 'soil'), html('th', {}, `kx (${unit})`), html('th', {}, `ky (${unit})`), html('th', {}, 'bedding'))),
    html('tbody', {}, body)));
}

/** Soil swatches for the picture legend (pixel space). */
export function drawSoilKey(legend, section) {
  legend.append(svg('text', { x: 0, y: 0 }, 'soil'));
  arr(section.soils).forEach((s, i) => {
    const y = 10 + i * 18;
    legend.append(svg('rect', { x: 0, y, width: 12, height: 12, fill: soilColour(i), stroke: '#5c584f' }));
    const name = String(s.id ?? `soil ${i + 1}`);
    legend.append(svg('text', { x: 16, y: y + 10 }, name.length > 13 ? name.slice(0, 12) + '…' : name));
  });
}

function soilIndex(section) {
  return new Map(arr(section.soils).map((s, i) => [s.id, i]));
}

function text(x, y, content, attrs = {}) {
  return svg('text', { x, y: -y, 'text-anchor': 'middle', ...attrs }, content);
}

function midpoint(points) {
  const a = points[0], b = points[points.length - 1];
  return [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
}

function arr(v) { return Array.isArray(v) ? v : []; }
function isPoint(p) { return Array.isArray(p) && p.length >= 2 && Number.isFinite(p[0]) && Number.isFinite(p[1]); }

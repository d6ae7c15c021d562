// The evidence part of the figures panel: the hand method of independent variables beside the FE heads, flow
// gauges, convergence over refinements and the truncation check — what a reviewer compares by hand.

import { html } from './dom.js';
import { sig, fixed } from './format.js';

/** Appends the evidence sections of a result document to the figures panel (nothing for absent parts). */
export function renderEvidence(container, result) {
  const iv = result.independentVariables;
  if (iv) {
    container.append(
      html('h3', {}, 'Independent variables beside FE'),
      html('p', { class: 'note' }, `${iv.structure}: b = ${fixed(iv.floorLength, 2)} m${iv.floorThickness > 0 ? `, underside ${fixed(iv.floorThickness, 2)} m below ground` : ''}, ` +
        `H = ${fixed(iv.headDifference, 2)} m; pressures in % of H.`),
      grid(['pile · point', 'method %', 'FE %', 'FE − method'], iv.piles.flatMap(p => ['E', 'D', 'C'].map(k => {
        const point = p[k.toLowerCase()];
        return [`${p.cutoff} · ${k}`, fixed(point.corrected, 1), fixed(point.fe, 1), fixed(point.difference, 1)];
      })), 'iv-table'));
    if (iv.exitGradient !== null && iv.exitGradient !== undefined)
      container.append(html('p', { class: 'note' }, `G_E by the method ${fixed(iv.exitGradient, 3)}; FE averaged ${fixed(iv.feExitGradient, 3)}, element row ${fixed(iv.feRowExitGradient, 3)}.`));
    if ((iv.correctionsNotApplied ?? []).length)
      container.append(html('p', { class: 'note' }, `Not applied: ${iv.correctionsNotApplied.join('; ')}.`));
    for (const note of iv.notes ?? []) container.append(html('p', { class: 'note' }, note));
    container.append(html('p', { class: 'note' }, `Source: ${iv.source}`));
  }

  if ((result.gauges ?? []).length) {
    container.append(html('h3', {}, 'Flow gauges'),
      grid(['gauge', 'flow (m³/s per m)', 'read from'], result.gauges.map(g => [g.name, sig(g.flow, 4), g.method]), 'gauge-table'));
  }

  const c = result.convergence;
  if (c) {
    container.append(html('h3', {}, 'Convergence over two refinements'),
      html('p', { class: 'note' }, `${c.triangles.join(' / ')} triangles.`),
      grid(['figure', 'values', 'order', 'est. error'], c.figures.map(f =>
        [`${f.name} (${f.unit})`, f.values.map(v => sig(v, 5)).join(' → '), f.observedOrder === null || f.observedOrder === undefined ? '—' : fixed(f.observedOrder, 2),
          `${sig(100 * f.estimatedError, 2)} %`]), 'convergence-table'));
  }

  const t = result.truncation;
  if (t) {
    container.append(html('h3', {}, 'Truncation check'),
      grid(['boundaries x (m)', 'flow (m³/s per m)'], [
        [`${fixed(t.leftX, 1)} … ${fixed(t.rightX, 1)}`, sig(t.flow, 5)],
        [`${fixed(t.extendedLeftX, 1)} … ${fixed(t.extendedRightX, 1)}`, sig(t.extendedFlow, 5)],
        ['change', `${sig(100 * t.change, 2)} %`],
      ], 'truncation-table'));
  }
}

function grid(headings, rows, id) {
  return html('table', { id },
    html('thead', {}, html('tr', {}, headings.map(h => html('th', {}, h)))),
    html('tbody', {}, rows.map(r => html('tr', {}, r.map((cell, i) => html('td', i === 0 ? {} : { class: 'num' }, cell))))));
}

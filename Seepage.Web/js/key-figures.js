// The key figures beside the picture: discharge, uplift resultant, piping (exit) factor, heave factors and the two
// creep ratios, each with the value, the required value and pass/fail, and a word on how it was obtained.

import { html, clear } from './dom.js';
import { sig, fixed } from './format.js';
import { flowIn } from './figures.js';

/** Fills the key-figures card from a result document; `stale` says the section was edited since. */
export function renderKeyFigures(container, result, unit, stale = false) {
  clear(container);
  const rows = [];
  const [q, qUnit] = flowIn(result.flow, unit);
  rows.push(row('flow', 'Seepage discharge', `${sig(q, 4)} ${qUnit}`, '—', undefined,
    'FE reactions on the fixed heads; no criterion'));
  for (const u of result.uplift ?? [])
    rows.push(row(`uplift-${u.structure}`, `Uplift resultant, ${u.structure}`, `${sig(u.force, 4)} kN/m at x = ${fixed(u.centroidX, 2)} m`,
      '—', undefined, '∫ γw(h − y) ds along the base, for the sliding and overturning checks'));
  const e = result.exit;
  if (e) {
    const value = e.factor === null || e.factor === undefined ? 'needs Gs and e' : fixed(e.factor, 2);
    rows.push(row('exit', 'Exit factor (piping)', value, `≥ ${fixed(e.requiredFactor, 2)}`, e.pass,
      `i_c / i, i = ${fixed(e.maxGradient, 3)} averaged over ${fixed(e.depth, 2)} m`));
  }
  for (const h of result.heave ?? []) {
    const value = h.factor === null || h.factor === undefined ? 'needs Gs and e' : fixed(h.factor, 2);
    rows.push(row(`heave-${h.cutoff}`, `Heave factor, ${h.cutoff}`, value, `≥ ${fixed(h.requiredFactor, 2)}`,
      h.skipped ? undefined : h.pass,
      h.skipped ? `not in the verdict: ${h.skipped}` : `Terzaghi prism, D = ${fixed(h.depth, 2)} m`));
  }
  const c = result.creep;
  if (c?.lane) rows.push(creep('lane', 'Creep ratio (Lane, weighted)', c.lane));
  if (c?.bligh) rows.push(creep('bligh', 'Creep ratio (Bligh)', c.bligh));
  if (stale) container.append(html('p', { class: 'stale-note' }, 'Of the previous analysis: the section has been edited since.'));
  container.append(html('table', { id: 'key-table' },
    html('colgroup', {}, ['figure', 'value', 'required', 'check'].map(c => html('col', { class: `c-${c}` }))),
    html('thead', {}, html('tr', {}, html('th', {}, 'figure'), html('th', {}, 'value'), html('th', {}, 'required'), html('th', {}, ''))),
    html('tbody', {}, rows), overall(result)));
}

// The section's verdict, naming the checks it covers (the result's passCovers) and those that gave no verdict.
function overall(result) {
  if (result.pass === undefined || result.pass === null) return html('tfoot', {});
  const covers = (result.passCovers ?? []).join(', ') || 'no check';
  const skipped = (result.checks ?? []).filter(c => c.skipped).map(c => c.check);
  const how = `covers ${covers}` + (skipped.length ? `; no verdict: ${skipped.join(', ')} (see All figures)` : '');
  return html('tfoot', {}, row('overall', 'Verdict of the checks', '', '', result.pass, how));
}

function creep(key, label, check) {
  const required = check.required === null || check.required === undefined ? 'no creep class' : `≥ ${fixed(check.required, 2)}`;
  return row(key, label, fixed(check.ratio, 2), required, check.pass, `L = ${fixed(check.weightedLength, 2)} m over H`);
}

function row(key, label, value, required, pass, how) {
  const status = pass === true ? html('span', { class: 'pill pass' }, 'pass')
    : pass === false ? html('span', { class: 'pill fail' }, 'fail') : html('span', { class: 'pill none' }, 'n/a');
  return html('tr', { 'data-key': key, class: pass === true ? 'pass' : pass === false ? 'fail' : undefined },
    html('td', {}, label, html('span', { class: 'how' }, how)),
    html('td', { class: 'num' }, value),
    html('td', { class: 'num' }, required),
    html('td', {}, status));
}

// The figures panel: engineering figures of one result with pass/fail against the required values.

import { html, clear } from './dom.js';
import { sig, fixed } from './format.js';
import { renderEvidence } from './evidence.js';

/** Flow per metre in the chosen unit: [value, unit label]. Values come from the server, not converted here. */
export function flowIn(flow, unit) {
  if (unit === 'm3day') return [flow.perMetrePerDay, 'm³/day per m'];
  if (unit === 'lmin') return [flow.litresPerMinutePerMetre, 'L/min per m'];
  return [flow.perMetre, 'm³/s per m'];
}

/** Fills the panel from an analysis result document. */
export function renderFigures(container, result, unit) {
  clear(container);
  const [q, qUnit] = flowIn(result.flow, unit);
  container.append(
    html('h3', {}, 'Seepage discharge'),
    table([
      row('flow per metre', html('span', { id: 'flow-value', 'data-unit': unit, 'data-raw': q }, `${sig(q, 4)} ${qUnit}`)),
      row('inflow / outflow', `${sig(result.flow.inflow, 4)} / ${sig(result.flow.outflow, 4)} m³/s per m`),
      row('balance (in − out) / in', `${sig(100 * result.flow.balance, 2)} %`),
      ...(result.flow.boundaries ?? []).map(b => row(`through ${b.name} (${b.kind})`, `${sig(b.flow, 4)} m³/s per m`)),
    ]));

  if ((result.uplift ?? []).length) {
    container.append(html('h3', {}, 'Uplift'), table(result.uplift.flatMap(u => [
      row(`${u.structure}: force`, `${sig(u.force, 4)} kN/m`),
      row(`${u.structure}: resultant at`, `x = ${fixed(u.centroidX, 2)} m`),
      row(`${u.structure}: moment about downstream toe`, `${sig(u.momentAboutDownstreamToe, 4)} kN·m/m`),
    ])));
  }

  const e = result.exit;
  if (e) {
    container.append(html('h3', {}, 'Exit gradient (piping)'), table([
      row('largest exit gradient', `${fixed(e.maxGradient, 3)} at x = ${fixed(e.at?.[0], 2)} m, y = ${fixed(e.at?.[1], 2)} m`),
      row('critical gradient i_c = (Gs − 1)/(1 + e)', Number.isFinite(e.criticalGradient) ? fixed(e.criticalGradient, 3) : 'needs Gs and e of the exit soil'),
      row('factor of safety i_c / i', e.factor === null || e.factor === undefined ? '—' : fixed(e.factor, 2), `≥ ${fixed(e.requiredFactor, 2)}`, e.pass),
      row('averaged over depth', `${fixed(e.depth, 2)} m`),
      row('method', html('span', { class: 'method' }, e.method ?? '—')),
    ], true));
  }

  if ((result.heave ?? []).length) {
    container.append(html('h3', {}, 'Heave at cutoffs'), table(result.heave.map(h =>
      row(`${h.cutoff} (D = ${fixed(h.depth, 2)} m, h_a = ${fixed(h.averageExcessHead, 3)} m)`,
        h.factor === null || h.factor === undefined ? 'needs Gs and e' : fixed(h.factor, 2), `≥ ${fixed(h.requiredFactor, 2)}`, h.pass)), true));
  }

  const c = result.creep;
  if (c) {
    container.append(html('h3', {}, 'Creep ratios (hand methods)'), table([
      creepRow('weighted creep (Lane)', c.lane),
      creepRow('line of creep (Bligh)', c.bligh),
    ], true));
  }

  renderEvidence(container, result);

  const m = result.mesh, s = result.solver;
  container.append(html('h3', {}, 'Mesh and solver'), table([
    row('mesh', `${m.nodes} nodes, ${m.triangles} triangles`),
    row('triangle angles', `${fixed(m.minAngle, 1)}° … ${fixed(m.maxAngle, 1)}°`),
    row('solver', `${s.method}${s.levels ? `, ${s.levels} levels` : ''}${s.operatorComplexity ? `, complexity ${fixed(s.operatorComplexity, 2)}` : ''}`),
    row('unknowns / iterations', `${s.unknowns} / ${s.iterations}`),
    row('final relative residual', sig(s.residual, 2)),
    row('time: mesh / solve / total', `${fixed(m.seconds, 3)} / ${fixed(s.seconds, 3)} / ${fixed(result.seconds, 3)} s`),
  ]));

  const warnings = result.warnings ?? [];
  container.append(html('h3', {}, `Warnings (${warnings.length})`),
    warnings.length ? html('ul', { class: 'warnings' }, warnings.map(w => html('li', {}, w))) : html('p', { class: 'note' }, 'None.'));
  container.append(html('p', { class: 'note' }, `Analysis ${result.id} · ${result.title} · ${new Date(result.createdAt).toISOString().replace('T', ' ').slice(0, 19)} UTC`));
}

function creepRow(label, check) {
  if (!check) return row(label, '—');
  const required = check.required === null || check.required === undefined ? 'no class given' : `≥ ${fixed(check.required, 2)}`;
  return row(`${label}, L = ${fixed(check.weightedLength, 2)} m`, fixed(check.ratio, 2), required, check.pass, check.source);
}

function table(rows, withChecks = false) {
  const head = withChecks
    ? html('thead', {}, html('tr', {}, html('th', {}, 'figure'), html('th', {}, 'value'), html('th', {}, 'required'), html('th', {}, 'check')))
    : null;
  return html('table', {}, head, html('tbody', {}, rows.map(r => (withChecks ? r : (r.lastChild.remove(), r.lastChild.remove(), r)))));
}

function row(label, value, required = '', pass = undefined, source = undefined) {
  const status = pass === true ? html('span', { class: 'pill pass' }, 'pass')
    : pass === false ? html('span', { class: 'pill fail' }, 'fail')
      : required ? html('span', { class: 'pill none' }, 'n/a') : '';
  return html('tr', { title: source },
    html('td', {}, label), html('td', { class: 'num' }, value), html('td', { class: 'num' }, required), html('td', {}, status));
}

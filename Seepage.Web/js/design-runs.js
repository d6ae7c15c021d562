// Design questions on the current section: a target search ("how deep must the pile go?") and an uncertainty study
// (Monte Carlo over conductivities and heads). The server does every computation; this module posts the request built from
// the form and the editor's section, follows the progress and shows the answer with links to the memo and the exports.

import { html, svg, clear } from './dom.js';
import { sig } from './format.js';

const BASE = 'api/v1';
const POLL_MS = 700, POLL_LIMIT = 900; // at most about 10 minutes of polling

const DEFAULT_VARIABLES = JSON.stringify([
  { member: '/soils/0/kx', distribution: 'lognormal', median: 3e-4, cov: 0.8 },
  { member: '/heads/0/total', distribution: 'normal', mean: 7.0, sd: 0.3 },
], null, 1);

/** Adds the collapsed "Design questions" pane at the end of the page; `sectionText` returns the editor's JSON text. */
export function mountDesignRuns(host, sectionText) {
  const out = html('div', { class: 'design-out', 'aria-live': 'polite' });
  const field = (label, attrs) => html('label', { class: 'design-field' }, label, ' ', html('input', attrs));
  const search = html('form', { class: 'design-form', id: 'target-form' },
    html('h3', {}, 'Target search'),
    field('member', { name: 'member', value: '/cutoffs/1/tip/1', size: 18 }),
    field('least-cost end', { name: 'from', value: '-3', size: 6 }),
    field('other end', { name: 'to', value: '-15', size: 6 }),
    field('exit factor ≥', { name: 'exitFactor', value: '3.0', size: 5 }),
    field('heave factor ≥', { name: 'heaveFactor', value: '1.5', size: 5 }),
    html('button', { class: 'button small', type: 'submit' }, 'Search'));
  const mc = html('form', { class: 'design-form', id: 'uncertainty-form' },
    html('h3', {}, 'Uncertainty study'),
    html('label', { class: 'design-field wide' }, 'variables (JSON)', html('textarea', { name: 'variables', rows: 6, spellcheck: 'false' }, DEFAULT_VARIABLES)),
    field('samples', { name: 'samples', value: '1000', size: 6 }),
    field('seed', { name: 'seed', value: '7', size: 6 }),
    html('button', { class: 'button small', type: 'submit' }, 'Run'));
  const pane = html('details', { class: 'pane design-pane', id: 'design-runs' },
    html('summary', {}, html('h2', { class: 'inline' }, 'Design questions')),
    html('p', { class: 'note' }, 'Both run on the section in the editor. A probability of failure is only as good as the distributions assumed; results need review by a licensed geotechnical engineer.'),
    search, mc, out);
  host.append(pane);

  search.addEventListener('submit', e => {
    e.preventDefault();
    const f = new FormData(search), require = {};
    for (const name of ['exitFactor', 'heaveFactor']) if (String(f.get(name)).trim()) require[name] = Number(f.get(name));
    submit(out, 'target-searches?background=true', base => ({ base, member: f.get('member'),
      range: [Number(f.get('from')), Number(f.get('to'))], require }), showSearch);
  });
  mc.addEventListener('submit', e => {
    e.preventDefault();
    const f = new FormData(mc);
    let variables;
    try { variables = JSON.parse(f.get('variables')); } catch (err) { showError(out, `The variables are not JSON: ${err.message}`); return; }
    submit(out, 'uncertainty-studies?background=true', base => ({ base, variables, samples: Number(f.get('samples')), seed: Number(f.get('seed')) }), showStudy);
  });

  async function submit(target, path, build, show) {
    let base;
    try { base = JSON.parse(sectionText()); } catch (err) { showError(target, `The section in the editor is not JSON: ${err.message}`); return; }
    clear(target).append(html('p', { class: 'note' }, 'Starting…'));
    const response = await fetch(`${BASE}/${path}`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(build(base)) });
    const body = await response.json().catch(() => null);
    if (!response.ok) { showProblems(target, body, response.status); return; }
    const location = response.headers.get('location');
    for (let i = 0; i < POLL_LIMIT; i++) {
      const state = i === 0 ? body : await (await fetch(location.replace(/^\//, ''))).json();
      show(target, state, location.replace(/^\//, ''));
      if (state.status !== 'running') return;
      await new Promise(r => setTimeout(r, POLL_MS));
    }
  }
}

function showSearch(target, s, link) {
  clear(target).append(
    html('p', {}, `${s.status}: ${s.done} of about ${s.total} analyses. `, s.message ?? ''),
    s.intervals.length > 1 ? html('p', {}, 'Feasible intervals: ' + s.intervals.map(i => `${sig(i.from)} … ${sig(i.to)}`).join('; ')) : '',
    table([s.member, 'flow m³/s per m', 'uplift kN/m', 'exit factor', 'heave factor', 'result'],
      s.points.map(p => [sig(p.value), sig(p.flow), sig(p.upliftForce), sig(p.exitFactor), sig(p.heaveFactor), p.pass ? 'meets all' : 'fails'])),
    html('div', { class: 'design-charts' },
      s.points.length > 1 ? curve(s.points.map(p => [p.value, p.exitFactor]), `factor against piping vs ${s.member}`, s.require.exitFactor, s.value) : '',
      s.points.length > 1 ? curve(s.points.map(p => [p.value, p.heaveFactor]), `factor against heave vs ${s.member}`, s.require.heaveFactor, s.value) : ''),
    links(link, [['report', 'Memo with the curves'], ['points.csv', 'Points CSV'], ['points.xlsx', 'Points workbook']]));
}

function showStudy(target, u, link) {
  const figures = Object.entries(u.figures);
  clear(target).append(
    html('p', {}, `${u.status}: ${u.done} of ${u.total} samples (${u.analysed} analysed, ${u.failed} not). ${u.method ?? ''}`),
    table(['figure', 'unit', 'mean', 'sd', '5 %', '50 %', '95 %', 'FOSM mean', 'FOSM sd'],
      figures.map(([name, f]) => [name, f.unit, sig(f.mean), sig(f.sd), sig(f.p05), sig(f.p50), sig(f.p95), sig(u.fosm[name]?.mean), sig(u.fosm[name]?.sd)])),
    table(['check', 'required factor', 'p_f', 'standard error', 'β'],
      Object.entries(u.checks).map(([name, c]) => [name, sig(c.requiredFactor), c.upperBound ? `0 (< ${sig(c.upperBound)})` : sig(c.probabilityOfFailure), sig(c.standardError), c.beta == null ? '—' : sig(c.beta)])),
    html('div', { class: 'design-charts' },
      ['exitFactor', 'heaveFactor'].filter(n => u.figures[n]).map(n => histogram(u.figures[n].histogram, `${n} over ${u.figures[n].count} samples`,
        u.checks[n === 'exitFactor' ? 'exit' : 'heave']?.requiredFactor))),
    links(link, [['report', 'Memo with the histograms'], ['samples.csv', 'Samples CSV'], ['samples.xlsx', 'Samples workbook']]));
}

// Small SVG charts of server figures (no computation here beyond placing points): W × H pixels, data mapped linearly.
const W = 320, H = 170, PAD = 34;

function frame(title, x0, x1, y0, y1, items) {
  const sx = x => PAD + (x - x0) / ((x1 - x0) || 1) * (W - PAD - 8), sy = y => H - PAD + 10 - (y - y0) / ((y1 - y0) || 1) * (H - PAD - 10);
  return html('figure', { class: 'design-chart' },
    svg('svg', { viewBox: `0 0 ${W} ${H}`, width: W, height: H, role: 'img', 'aria-label': title },
      svg('rect', { x: PAD, y: 10, width: W - PAD - 8, height: H - PAD - 10, fill: 'none', stroke: '#999' }),
      svg('text', { x: PAD, y: H - 8, 'font-size': 10 }, sig(x0)), svg('text', { x: W - 8, y: H - 8, 'font-size': 10, 'text-anchor': 'end' }, sig(x1)),
      svg('text', { x: PAD - 3, y: H - PAD + 10, 'font-size': 10, 'text-anchor': 'end' }, sig(y0)),
      svg('text', { x: PAD - 3, y: 18, 'font-size': 10, 'text-anchor': 'end' }, sig(y1)),
      ...items(sx, sy).flat(2)),
    html('figcaption', {}, title));
}

function curve(points, title, requirement, found) {
  const pts = points.filter(p => p[1] != null).sort((a, b) => a[0] - b[0]);
  if (pts.length < 2) return '';
  const xs = pts.map(p => p[0]), ys = pts.map(p => p[1]).concat(requirement ?? []);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  return frame(title, x0, x1, y0, y1, (sx, sy) => [
    svg('polyline', { points: pts.map(p => `${sx(p[0])},${sy(p[1])}`).join(' '), fill: 'none', stroke: '#1f5fbf', 'stroke-width': 1.5 }),
    pts.map(p => svg('circle', { cx: sx(p[0]), cy: sy(p[1]), r: 2.2, fill: '#1f5fbf' })),
    requirement == null ? '' : svg('line', { x1: sx(x0), x2: sx(x1), y1: sy(requirement), y2: sy(requirement), stroke: '#b03a2e', 'stroke-dasharray': '5 3' }),
    found == null ? '' : svg('line', { x1: sx(found), x2: sx(found), y1: sy(y0), y2: sy(y1), stroke: '#2a9d4a', 'stroke-width': 1.5 }),
  ]);
}

function histogram(h, title, allowable) {
  const edges = h.edges, counts = h.counts, top = Math.max(1, ...counts);
  const x0 = Math.min(edges[0], allowable ?? Infinity), x1 = Math.max(edges[edges.length - 1], allowable ?? -Infinity);
  return frame(title, x0, x1, 0, top, (sx, sy) => [
    counts.map((c, i) => c === 0 ? '' : svg('rect', { x: sx(edges[i]), y: sy(c), width: Math.max(0.5, sx(edges[i + 1]) - sx(edges[i])), height: sy(0) - sy(c), fill: '#9db7e0', stroke: '#1f5fbf', 'stroke-width': 0.5 })),
    allowable == null ? '' : svg('line', { x1: sx(allowable), x2: sx(allowable), y1: sy(0), y2: sy(top), stroke: '#b03a2e', 'stroke-width': 1.5, 'stroke-dasharray': '5 3' }),
  ]);
}

function table(headers, rows) {
  return html('table', { class: 'design-table' }, html('thead', {}, html('tr', {}, headers.map(h => html('th', {}, h)))),
    html('tbody', {}, rows.map(r => html('tr', {}, r.map(c => html('td', {}, c))))));
}

function links(base, items) {
  return html('p', {}, items.flatMap(([path, text]) => [html('a', { href: `${base}/${path}`, target: '_blank', rel: 'noopener' }, text), ' ']));
}

function showProblems(target, body, status) {
  const errors = body?.errors ?? {};
  clear(target).append(html('p', { class: 'alert' }, body?.title ?? `The service answered ${status}.`),
    html('ul', {}, Object.entries(errors).map(([k, v]) => html('li', {}, `${k || '(body)'}: ${v.join(' ')}`))));
}

function showError(target, text) {
  clear(target).append(html('p', { class: 'alert' }, text));
}

// Mounts itself below the bench when the page has the section editor (one script tag is the whole hook).
const editorEl = document.getElementById('editor');
if (editorEl) {
  document.head.append(html('link', { rel: 'stylesheet', href: 'css/design-runs.css' }));
  const host = html('div', { class: 'design-host' });
  (document.querySelector('footer.foot') ?? document.body.lastChild).before(host);
  mountDesignRuns(host, () => editorEl.value);
}

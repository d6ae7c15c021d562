// The study panel: alternatives of the section in a grid (members chosen by name), run in the background with
// progress and cancel, then the comparison table and chart; any alternative opens in the picture.

import { html, clear } from './dom.js';
import { api } from './api.js';
import { sig, fixed } from './format.js';
import { studyMembers } from './study-members.js';
import { studyChart, CHART_FIGURES } from './study-chart.js';

const POLL_MS = 400;

export class StudyView {
  constructor(container, { getSection, openAnalysis }) {
    this.el = container;
    this.getSection = getSection;
    this.openAnalysis = openAnalysis;
    this.pointers = [];
    this.alternatives = [];
    this.study = null;
    this.figure = 'flow';
  }

  /** Redraws the set-up grid for the current section (labels follow renamed members). */
  refresh() {
    const doc = this.getSection();
    clear(this.el);
    if (!doc) { this.el.append(html('p', { class: 'note' }, 'Open a section first.')); return; }
    const members = studyMembers(doc);
    const byPointer = new Map(members.map(m => [m.pointer, m]));
    const free = members.filter(m => !this.pointers.includes(m.pointer));
    const pick = html('select', { id: 'study-member', 'aria-label': 'Member to vary' }, free.map(m => html('option', { value: m.pointer }, m.label)));
    this.el.append(
      html('p', { class: 'note' }, 'Each alternative is the section with the values given; a blank cell keeps the section’s value.'),
      html('div', { class: 'row' }, html('label', { for: 'study-member' }, 'Vary'), pick,
        html('button', { type: 'button', class: 'button small', id: 'study-add-member', disabled: free.length === 0,
          onclick: () => { this.pointers.push(pick.value); this.ensureRows(); this.refresh(); } }, 'Add column')));
    if (this.pointers.length) this.el.append(this.grid(byPointer));
    this.el.append(html('div', { class: 'row' },
      html('button', { type: 'button', class: 'button small', id: 'study-add-row', onclick: () => { this.addRow(); this.refresh(); } }, '+ alternative'),
      html('button', { type: 'button', class: 'button primary', id: 'study-run', disabled: !this.alternatives.length || !this.pointers.length,
        onclick: () => this.run() }, 'Run study'),
      html('button', { type: 'button', class: 'button danger', id: 'study-cancel', hidden: !this.running, onclick: () => this.cancel() }, 'Cancel'),
      html('span', { id: 'study-progress', class: 'note', role: 'status' }, this.progress ?? '')));
    if (this.study) this.el.append(this.results());
  }

  grid(byPointer) {
    const head = html('tr', {}, html('th', {}, 'alternative'), this.pointers.map((p, j) => html('th', { title: p },
      byPointer.get(p)?.label ?? p, ' ',
      html('button', { type: 'button', class: 'button small', 'aria-label': `Stop varying ${p}`,
        onclick: () => { this.pointers.splice(j, 1); this.refresh(); } }, '×'))), html('th', {}, ''));
    const rows = this.alternatives.map((alt, i) => html('tr', { 'data-row': i },
      html('td', {}, html('input', { type: 'text', value: alt.name, 'aria-label': `Name of alternative ${i + 1}`, 'data-study': 'name',
        oninput: e => { alt.name = e.target.value; } })),
      this.pointers.map(p => html('td', {}, html('input', { type: 'text', value: alt.values[p] ?? '', size: 6, 'data-study': p,
        placeholder: byPointer.has(p) ? String(byPointer.get(p).value) : '', 'aria-label': `${byPointer.get(p)?.label ?? p}, alternative ${i + 1}`,
        oninput: e => { alt.values[p] = e.target.value; } }))),
      html('td', {}, html('button', { type: 'button', class: 'button small', 'aria-label': `Remove alternative ${i + 1}`,
        onclick: () => { this.alternatives.splice(i, 1); this.refresh(); } }, '×'))));
    return html('div', { class: 'wide-table form-editor' }, html('table', { id: 'study-grid' }, html('thead', {}, head), html('tbody', {}, rows)));
  }

  ensureRows() { while (this.alternatives.length < 2) this.addRow(); }

  addRow() { this.alternatives.push({ name: `alternative ${this.alternatives.length + 1}`, values: {} }); }

  /** The study request: the section as the base, one change set per alternative. */
  request() {
    return {
      base: this.getSection(),
      alternatives: this.alternatives.map(a => ({
        name: a.name,
        changes: Object.fromEntries(this.pointers.filter(p => (a.values[p] ?? '').trim() !== '').map(p => [p, value(a.values[p])])),
      })),
    };
  }

  async run() {
    this.abort = new AbortController();
    this.running = true;
    this.study = null;
    this.progress = 'Starting…';
    this.refresh();
    try {
      let study = await api.startStudy(this.request(), this.abort.signal);
      this.studyId = study.id;
      while (study.status === 'running') {
        this.progress = `${study.done} of ${study.total} alternatives done`;
        this.setProgress();
        await new Promise(r => setTimeout(r, POLL_MS));
        study = await api.study(study.id, this.abort.signal);
      }
      this.study = study;
      this.progress = `Study ${study.status}: ${study.done} of ${study.total} in ${fixed(study.seconds, 1)} s`;
    } catch (e) {
      this.progress = e.name === 'AbortError' ? this.progress : `The study failed: ${e.message}`;
    } finally {
      this.running = false;
      this.refresh();
    }
  }

  async cancel() {
    this.abort?.abort();
    let stopped = false;
    if (this.studyId) { try { await api.deleteStudy(this.studyId); stopped = true; } catch { stopped = false; } }
    this.progress = stopped ? 'Study cancelled and removed.'
      : `Stopped following the study; the service finishes it (rows at /api/v1/studies/${this.studyId ?? '…'}).`;
    this.running = false;
    this.refresh();
  }

  setProgress() { const el = this.el.querySelector('#study-progress'); if (el) el.textContent = this.progress; }

  results() {
    const s = this.study;
    const pick = html('select', { id: 'study-figure', 'aria-label': 'Figure to chart' },
      Object.entries(CHART_FIGURES).map(([k, v]) => html('option', { value: k, selected: k === this.figure }, v.label)));
    pick.addEventListener('change', () => { this.figure = pick.value; this.refresh(); });
    const rows = s.rows.map(r => html('tr', { 'data-analysis-id': r.analysisId ?? '', 'data-name': r.name },
      html('td', {}, r.name),
      html('td', { class: 'num' }, r.valid ? sig(r.flow, 4) : 'invalid'),
      html('td', { class: 'num' }, sig(r.upliftForce, 4)),
      html('td', { class: 'num' }, fixed(r.exitFactor, 2)),
      html('td', { class: 'num' }, fixed(r.heaveFactor, 2)),
      html('td', {}, r.pass === true ? html('span', { class: 'pill pass' }, 'pass') : r.pass === false ? html('span', { class: 'pill fail' }, 'fail')
        : html('span', { class: 'pill none' }, r.valid ? 'n/a' : 'invalid')),
      html('td', {}, r.analysisId ? html('button', { type: 'button', class: 'button small', onclick: () => this.openAnalysis(r.analysisId, r.name) }, 'Open') : '')));
    const invalid = s.rows.filter(r => !r.valid).map(r => html('li', {}, `${r.name}: `,
      Object.entries(r.problems ?? {}).map(([k, v]) => `${k} ${v.join(' ')}`).join('; ')));
    return html('div', { class: 'study-results', 'data-study-id': s.id },
      html('h3', {}, 'Comparison'),
      html('div', { class: 'wide-table' }, html('table', { id: 'study-results' },
        html('thead', {}, html('tr', {}, ['alternative', 'flow (m³/s per m)', 'uplift (kN/m)', 'exit factor', 'heave factor', 'checks', ''].map(h => html('th', {}, h)))),
        html('tbody', {}, rows))),
      invalid.length ? html('ul', { class: 'warnings' }, invalid) : null,
      html('div', { class: 'row' }, html('label', { for: 'study-figure' }, 'Chart'), pick),
      studyChart(s.rows, this.figure),
      html('p', { class: 'note' }, html('a', { href: `/api/v1/studies/${encodeURIComponent(s.id)}/report`, target: '_blank', rel: 'noopener' }, 'Comparison memo'),
        ' · ', html('a', { href: `/api/v1/studies/${encodeURIComponent(s.id)}?format=csv`, download: `study-${s.id}.csv` }, 'Rows as CSV')),
      html('p', { class: 'caution' }, s.caution));
  }
}

/** A cell's value: a number, a JSON array or object such as [15,-8], or else the text itself (the service checks it). */
function value(text) {
  const t = text.trim();
  const n = Number(t);
  if (t !== '' && Number.isFinite(n)) return n;
  if (/^[[{]/.test(t)) { try { return JSON.parse(t); } catch { return t; } }
  return t;
}

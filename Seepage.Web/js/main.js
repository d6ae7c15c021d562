// Page wiring: examples, editor, validation messages, the run button, and the result panels.

import { byId, clear, html } from './dom.js';
import { api, ApiError } from './api.js';
import { SectionEditor } from './editor.js';
import { formatJson } from './json-format.js';
import { problemItems, syntaxItem, describePointer } from './problems.js';
import { locatePointers, lineOfPointer, normalisePointer, valueAt } from './json-locate.js';
import { Picture } from './picture.js';
import { Scene } from './scene.js';
import { renderSoilLegend } from './section-view.js';
import { renderFigures } from './figures.js';
import { upliftPlot, exitPlot } from './plots.js';
import { download, svgText, svgToPng, upliftCsv, exitCsv, slug } from './exporter.js';

const FALLBACK_CAUTION = 'Results depend on the idealisation and the soil data. They need review by a licensed geotechnical engineer; local codes govern the required factors of safety.';

const state = { result: null, field: null, section: null, checkSeq: 0, previewTimer: 0, checkTimer: 0 };

const picture = new Picture(byId('picture-box'));
const scene = new Scene(picture, {
  probeEl: byId('probe'),
  flowNetEl: byId('flow-net'),
  toggles: { fill: byId('show-fill'), equipotentials: byId('show-equipotentials'), flowlines: byId('show-flowlines'), mesh: byId('show-mesh'), arrows: byId('show-arrows') },
});
const editor = new SectionEditor({ onChange: text => onEdit(text) });

wireControls();
start();

async function start() {
  try {
    const examples = await api.examples();
    const pick = byId('example-pick');
    for (const ex of examples) pick.append(html('option', { value: ex.name }, ex.title || ex.name));
    if (examples.length === 0) { showAlert('The service offers no example sections.'); return; }
    const wanted = new URLSearchParams(location.search).get('example');
    const first = examples.find(e => e.name === wanted) ?? examples.find(e => e.isDefault) ?? examples[0];
    pick.value = first.name;
    describeExample(examples, first.name);
    pick.addEventListener('change', async () => { describeExample(examples, pick.value); await loadExample(pick.value); });
    await loadExample(first.name);
    // ?run=0 opens the section without analysing it (for looking at a preview only).
    if (new URLSearchParams(location.search).get('run') !== '0') await run();
  } catch (e) {
    setRunState('error');
    showAlert(`The page could not start: ${e.message}`);
  }
}

function describeExample(examples, name) {
  byId('example-note').textContent = examples.find(e => e.name === name)?.description ?? '';
}

async function loadExample(name) {
  const doc = await api.example(name);
  editor.setText(formatJson(doc));
}

/** Editor changed: redraw the preview soon, check with the service a little later. */
function onEdit(text) {
  clearTimeout(state.previewTimer);
  clearTimeout(state.checkTimer);
  const immediate = !state.section;
  const preview = () => {
    let doc;
    try { doc = JSON.parse(text); } catch (e) { showChecks([syntaxItem(e, text)], 'bad', 'JSON syntax error'); return; }
    state.section = doc;
    renderSoilLegend(byId('soil-legend'), doc);
    if (state.result) markStale();
    scene.showSection(doc);
    state.checkTimer = setTimeout(() => check(text, doc), 500);
  };
  if (immediate) preview(); else state.previewTimer = setTimeout(preview, 250);
}

async function check(text, doc) {
  const seq = ++state.checkSeq;
  setCheckState('', 'Checking…');
  try {
    const answer = await api.validate(text);
    if (seq !== state.checkSeq) return;
    const warnings = warningItems(answer?.warnings, text, doc);
    showChecks(warnings, 'ok', warnings.length ? `Valid, ${warnings.length} warning(s)` : 'Section is valid');
  } catch (e) {
    if (seq !== state.checkSeq) return;
    if (e instanceof ApiError && e.status === 400) {
      const items = problemItems(e.problem, text, doc);
      showChecks(items, 'bad', `${items.length} problem(s) in the section`);
    } else {
      showChecks([], 'bad', `Could not check the section: ${e.message}`);
    }
  }
}

function warningItems(warnings, text, doc) {
  if (!Array.isArray(warnings) || warnings.length === 0) return [];
  const spots = locatePointers(text);
  return warnings.map(w => {
    const message = typeof w === 'string' ? w : (w.message ?? JSON.stringify(w));
    const pointer = typeof w === 'object' && w?.pointer ? normalisePointer(w.pointer) : guessPointer(message, doc);
    return { warning: true, pointer: pointer ?? '', where: pointer ? describePointer(pointer, doc) : 'section', messages: [message],
      line: pointer ? lineOfPointer(text, spots, pointer) : null };
  });
}

/** "Zone 1 outline …" names zones[1]: point the warning there when the section has that item. */
function guessPointer(message, doc) {
  const m = /\b(zone|soil|cutoff|structure|head|drain)s?\s+(\d+)\b/i.exec(message);
  if (!m) return null;
  const pointer = `/${m[1].toLowerCase()}s/${m[2]}`;
  return valueAt(doc, pointer) === undefined ? null : pointer;
}

function showChecks(items, mood, summary) {
  setCheckState(mood, summary);
  const list = byId('check-list');
  clear(list);
  editor.markLines(items.filter(i => !i.warning).map(i => i.line));
  if (items.length === 0) return;
  list.append(html('ul', {}, items.map(item => html('li', { class: item.warning ? 'warning' : 'problem', 'data-pointer': item.pointer },
    html('button', { type: 'button', onclick: () => item.line && editor.goToLine(item.line) },
      html('span', { class: 'where' }, item.where),
      item.line ? html('span', { class: 'line' }, `line ${item.line}`) : null,
      html('br'),
      item.messages.join(' '))))));
}

function setCheckState(mood, text) {
  const el = byId('check-state');
  el.className = `check-state ${mood}`;
  el.textContent = text;
}

/** Posts the editor's section, then draws the result and its field. */
async function run() {
  clearTimeout(state.previewTimer);
  const text = editor.text;
  let doc;
  try { doc = JSON.parse(text); } catch (e) {
    showChecks([syntaxItem(e, text)], 'bad', 'JSON syntax error');
    showAlert('The section is not valid JSON; see the message beside the editor.');
    return;
  }
  setRunState('busy');
  hideAlert();
  try {
    const result = await api.analyse(text);
    const field = await api.field(result.id);
    state.result = result;
    state.field = field;
    state.section = doc;
    renderSoilLegend(byId('soil-legend'), doc);
    scene.showAnalysis(doc, result, field);
    renderResult();
    document.body.dataset.runs = String(Number(document.body.dataset.runs || 0) + 1);
    setRunState('done');
  } catch (e) {
    setRunState('error');
    if (e instanceof ApiError && e.status === 400 && e.problem) {
      const items = problemItems(e.problem, text, doc);
      showChecks(items, 'bad', `${items.length} problem(s) in the section`);
      showAlert(e.problem.title || 'The section was rejected.', items.map(i => `${i.where}: ${i.messages.join(' ')}`));
    } else {
      showAlert(`The analysis failed: ${e.message}`);
    }
  }
}

function renderResult() {
  const result = state.result;
  const caution = byId('caution');
  caution.textContent = `Caution: ${result.caution || FALLBACK_CAUTION}`;
  caution.hidden = false;
  byId('figures').dataset.analysisId = result.id;
  byId('plots-heading').textContent = 'Plots';
  renderFigures(byId('figures'), result, byId('flow-unit').value);
  const uplift = clear(byId('uplift-plots'));
  for (const u of result.uplift ?? []) if (u.stations?.length >= 2) uplift.append(upliftPlot(u));
  const exit = clear(byId('exit-plot'));
  if (result.exit?.profile?.length >= 2) exit.append(exitPlot(result.exit));
  if (!uplift.firstChild && !exit.firstChild) uplift.append(html('p', { class: 'note' }, 'This section has no structure base or exit surface to plot.'));
}

function markStale() {
  const note = byId('figures').querySelector('.stale') ?? html('p', { class: 'note stale' });
  note.textContent = 'The section has been edited since this analysis; press “Analyse section” to update the figures.';
  byId('figures').prepend(note);
  const plots = byId('plots-heading');
  plots.textContent = 'Plots (of the previous analysis)';
}

function setRunState(s) {
  document.body.dataset.runState = s;
  const busy = s === 'busy';
  byId('run').disabled = busy;
  byId('busy').hidden = !busy;
  byId('picture-box').setAttribute('aria-busy', String(busy));
}

function showAlert(message, lines = []) {
  const el = byId('alert');
  clear(el);
  el.append(html('strong', {}, message));
  if (lines.length) el.append(html('ul', {}, lines.map(l => html('li', {}, l))));
  el.hidden = false;
}

function hideAlert() { byId('alert').hidden = true; }

function wireControls() {
  byId('run').addEventListener('click', run);
  byId('zoom-in').addEventListener('click', () => picture.zoom(1 / 1.4));
  byId('zoom-out').addEventListener('click', () => picture.zoom(1.4));
  byId('zoom-fit').addEventListener('click', () => picture.fit());
  byId('flow-unit').addEventListener('change', () => state.result && renderFigures(byId('figures'), state.result, byId('flow-unit').value));
  byId('file-open').addEventListener('click', () => byId('file-pick').click());
  byId('file-pick').addEventListener('change', async e => {
    const file = e.target.files?.[0];
    if (file) editor.setText(await file.text());
    e.target.value = '';
  });
  const name = () => slug(state.result?.title ?? state.section?.title);
  byId('export-svg').addEventListener('click', () => download(new Blob([svgText(picture.exportClone())], { type: 'image/svg+xml' }), `${name()}.svg`));
  byId('export-png').addEventListener('click', async () => {
    try { download(await svgToPng(picture.exportClone()), `${name()}.png`); } catch (e) { showAlert(e.message); }
  });
  const needResult = fn => () => (state.result ? fn() : showAlert('Analyse the section first.'));
  byId('export-uplift').addEventListener('click', needResult(() => download(new Blob([upliftCsv(state.result)], { type: 'text/csv' }), `${name()}-uplift.csv`)));
  byId('export-exit').addEventListener('click', needResult(() => download(new Blob([exitCsv(state.result)], { type: 'text/csv' }), `${name()}-exit-profile.csv`)));
  byId('export-json').addEventListener('click', needResult(() => download(new Blob([JSON.stringify(state.result, null, 2)], { type: 'application/json' }), `${name()}-result.json`)));
  // The memo is built by the server from the stored analysis; the page only opens it.
  const memo = query => needResult(() => window.open(`/api/v1/analyses/${encodeURIComponent(state.result.id)}/report${query}`, '_blank', 'noopener'));
  byId('open-memo').addEventListener('click', memo(''));
  byId('open-memo-pdf').addEventListener('click', memo('?format=pdf'));
}

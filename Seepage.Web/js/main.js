// Page wiring: examples and files, the form and JSON editors kept in step, checks, the run and cancel buttons,
// the key figures beside the picture, the detail panels and the downloads.

import { byId, clear, html } from './dom.js';
import { api, ApiError } from './api.js';
import { SectionEditor } from './editor.js';
import { FormEditor } from './form-editor.js';
import { Tabs } from './tabs.js';
import { WorkStore } from './work-store.js';
import { formatJson } from './json-format.js';
import { problemItems, syntaxItem } from './problems.js';
import { warningItems, showChecks as renderChecks, setCheckState, showEstimate } from './check-view.js';
import { Picture } from './picture.js';
import { Scene } from './scene.js';
import { renderSoilLegend } from './section-view.js';
import { renderFigures } from './figures.js';
import { renderKeyFigures } from './key-figures.js';
import { upliftPlot, exitPlot } from './plots.js';
import { wireExports } from './export-buttons.js';
import { StudyView } from './study-view.js';

const FALLBACK_CAUTION = 'Results depend on the idealisation and the soil data. They need review by a licensed geotechnical engineer; local codes govern the required factors of safety.';

const state = { result: null, field: null, section: null, analysedText: null, checkSeq: 0, previewTimer: 0, checkTimer: 0, abort: null };

const picture = new Picture(byId('picture-box'));
const scene = new Scene(picture, {
  probeEl: byId('probe'),
  flowNetEl: byId('flow-net'),
  toggles: { fill: byId('show-fill'), equipotentials: byId('show-equipotentials'), flowlines: byId('show-flowlines'), mesh: byId('show-mesh'), arrows: byId('show-arrows') },
});
const study = new StudyView(byId('study-view'), { getSection: () => state.section, openAnalysis: (id, name) => openStored(id, name) });
const tabs = new Tabs(['form', 'json', 'figures', 'plots', 'study'], name => { if (name === 'study') study.refresh(); });
const editor = new SectionEditor({ onChange: text => onEdit(text, 'json') });
const form = new FormEditor(byId('form-editor'), { onChange: doc => fromForm(doc) });
const store = new WorkStore();

wireControls();
start();

async function start() {
  try {
    const examples = await api.examples();
    const pick = byId('example-pick');
    for (const ex of examples) pick.append(html('option', { value: ex.name }, ex.title || ex.name));
    if (examples.length === 0) { showAlert('The service offers no example sections.'); return; }
    const params = new URLSearchParams(location.search);
    const wanted = params.get('example');
    const first = examples.find(e => e.name === wanted) ?? examples.find(e => e.isDefault) ?? examples[0];
    pick.value = first.name;
    pick.dataset.current = first.name;
    describeExample(examples, first.name);
    pick.addEventListener('change', () => switchExample(examples, pick));
    const kept = wanted ? null : store.restore();
    if (kept) {
      store.baseline = kept.baseline ?? null;
      store.origin = kept.origin ?? '';
      editor.setText(kept.text);
      showWorkNote(`Restored the section you were working on (kept in this browser, ${kept.savedAt?.slice(0, 16).replace('T', ' ')} UTC).`);
    } else {
      await loadExample(first.name);
    }
    // ?run=0 opens the section without analysing it (for looking at a preview only).
    if (params.get('run') !== '0') await run();
  } catch (e) {
    setRunState('error');
    showAlert(`The page could not start: ${e.message}`);
  }
}

function describeExample(examples, name) {
  byId('example-note').textContent = examples.find(e => e.name === name)?.description ?? '';
}

async function switchExample(examples, pick) {
  if (store.isDirty(editor.text) &&
      !window.confirm('Replace the section you have edited with this example? Your edits are not saved to a file ' +
        '(use Save first to keep them).')) {
    pick.value = pick.dataset.current;
    return;
  }
  pick.dataset.current = pick.value;
  describeExample(examples, pick.value);
  await loadExample(pick.value);
}

async function loadExample(name) {
  const text = formatJson(await api.example(name));
  store.opened(text, `example ${name}`);
  editor.setText(text);
}

/** The form changed the document: write the JSON text, then handle it as an edit that the form need not redraw. */
function fromForm(doc) {
  const text = formatJson(doc);
  editor.replaceText(text);
  onEdit(text, 'form');
}

/** Editor changed: keep it, redraw the preview soon, check with the service a little later. */
function onEdit(text, from) {
  store.keep(text);
  clearTimeout(state.previewTimer);
  clearTimeout(state.checkTimer);
  const immediate = !state.section;
  const preview = () => {
    let doc;
    try { doc = JSON.parse(text); } catch (e) { showChecks([syntaxItem(e, text)], 'bad', 'JSON syntax error'); return; }
    state.section = doc;
    if (from !== 'form') form.show(doc);
    if (tabs.current === 'study' && !study.running) study.refresh();
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
    showEstimate(answer?.estimate);
  } catch (e) {
    if (seq !== state.checkSeq) return;
    showEstimate(null);
    if (e instanceof ApiError && e.status === 400) {
      const items = problemItems(e.problem, text, doc);
      showChecks(items, 'bad', `${items.length} problem(s) in the section`);
    } else {
      showChecks([], 'bad', `Could not check the section: ${e.message}`);
    }
  }
}

function showChecks(items, mood, summary) {
  renderChecks(items, mood, summary, {
    markLines: lines => editor.markLines(lines),
    goTo: line => { tabs.select('json'); editor.goToLine(line); },
  });
}

/** Posts the editor's section, then draws the result and its field. Cancel aborts both requests. */
async function run() {
  clearTimeout(state.previewTimer);
  const text = editor.text;
  let doc;
  try { doc = JSON.parse(text); } catch (e) {
    showChecks([syntaxItem(e, text)], 'bad', 'JSON syntax error');
    showAlert('The section is not valid JSON; see the message beside the editor.');
    return;
  }
  const abort = new AbortController();
  state.abort = abort;
  setRunState('busy');
  hideAlert();
  try {
    byId('busy-text').textContent = 'Meshing, solving and checking…';
    const result = await api.analyse(text, abort.signal);
    byId('busy-text').textContent = 'Fetching the flow net…';
    const field = await api.field(result.id, abort.signal);
    Object.assign(state, { result, field, section: doc, analysedText: text });
    renderSoilLegend(byId('soil-legend'), doc);
    scene.showAnalysis(doc, result, field);
    renderResult();
    document.body.dataset.runs = String(Number(document.body.dataset.runs || 0) + 1);
    setRunState('done');
  } catch (e) {
    if (e.name === 'AbortError') {
      setRunState('cancelled');
      showAlert('Analysis cancelled; the service stops its work on it. The figures shown are of the previous analysis.');
    } else if (e instanceof ApiError && e.status === 400 && e.problem) {
      setRunState('error');
      const items = problemItems(e.problem, text, doc);
      showChecks(items, 'bad', `${items.length} problem(s) in the section`);
      showAlert(e.problem.title || 'The section was rejected.', items.map(i => `${i.where}: ${i.messages.join(' ')}`));
    } else {
      setRunState('error');
      showAlert(`The analysis failed: ${e.message}`);
    }
  } finally {
    if (state.abort === abort) state.abort = null;
  }
}

/** Shows a stored analysis (a study's alternative) in the picture and the figures; the editor keeps its section. */
async function openStored(id, name) {
  hideAlert();
  try {
    const [result, field, section] = await Promise.all([api.analysis(id), api.field(id), api.section(id)]);
    Object.assign(state, { result, field, analysedText: editor.text });
    scene.showAnalysis(section, result, field);
    renderResult();
    showWorkNote(`Showing the alternative “${name}” (analysis ${id}); the downloads and the memo are of it. ` +
      'The editor still holds the base section: “Analyse section” returns to it.');
  } catch (e) {
    showAlert(`The alternative could not be opened: ${e.message}`);
  }
}

function renderResult() {
  const result = state.result;
  const caution = byId('caution');
  caution.textContent = `Caution: ${result.caution || FALLBACK_CAUTION}`;
  caution.hidden = false;
  byId('figures').dataset.analysisId = result.id;
  renderKeyFigures(byId('key-figures'), result, byId('flow-unit').value);
  renderFigures(byId('figures'), result, byId('flow-unit').value);
  const uplift = clear(byId('uplift-plots'));
  for (const u of result.uplift ?? []) if (u.stations?.length >= 2) uplift.append(upliftPlot(u));
  const exit = clear(byId('exit-plot'));
  if (result.exit?.profile?.length >= 2) exit.append(exitPlot(result.exit));
  if (!uplift.firstChild && !exit.firstChild) uplift.append(html('p', { class: 'note' }, 'This section has no structure base or exit surface to plot.'));
  byId('export-note').hidden = true;
}

/** The section differs from the analysed one: say so on the figures and the downloads, and offer a re-run. */
function markStale() {
  const stale = state.analysedText !== null && editor.text !== state.analysedText;
  renderKeyFigures(byId('key-figures'), state.result, byId('flow-unit').value, stale);
  const figures = byId('figures');
  figures.querySelector('.stale')?.remove();
  if (stale) figures.prepend(html('p', { class: 'note stale' }, 'The section has been edited since this analysis; press “Analyse section” to update the figures.'));
  byId('plots-heading').textContent = stale ? 'Plots (of the previous analysis)' : 'Plots';
  const note = clear(byId('export-note'));
  note.hidden = !stale;
  if (stale) note.append(`The result downloads and the memo are of analysis ${state.result.id}, made before your latest edits; `,
    'the picture shows the edited section without results. ',
    html('button', { type: 'button', class: 'button small', id: 'rerun', onclick: run }, 'Re-run to export the current section'));
}

function setRunState(s) {
  document.body.dataset.runState = s;
  const busy = s === 'busy';
  byId('run').disabled = busy;
  byId('busy').hidden = !busy;
  byId('cancel').hidden = !busy;
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

function showWorkNote(text) {
  const el = byId('work-note');
  el.textContent = text;
  el.hidden = false;
}

async function openFile(file) {
  if (/\.(csv|xlsx)$/i.test(file.name)) {
    try {
      const doc = await api.importSection(file);
      const text = formatJson(doc);
      store.opened(text, `file ${file.name}`);
      editor.setText(text);
      showWorkNote(`Opened ${file.name} (read by the service's spreadsheet import).`);
    } catch (e) {
      const items = e instanceof ApiError && e.problem ? problemItems(e.problem, '', {}) : [];
      showAlert(`${file.name} could not be read: ${e.problem?.title ?? e.message}`, items.map(i => `${i.where}: ${i.messages.join(' ')}`));
    }
    return;
  }
  const text = await file.text();
  store.opened(text, `file ${file.name}`);
  editor.setText(text);
}

function wireControls() {
  byId('run').addEventListener('click', run);
  byId('cancel').addEventListener('click', () => state.abort?.abort());
  byId('zoom-in').addEventListener('click', () => picture.zoom(1 / 1.4));
  byId('zoom-out').addEventListener('click', () => picture.zoom(1.4));
  byId('zoom-fit').addEventListener('click', () => picture.fit());
  byId('zoom-all').addEventListener('click', () => picture.fitAll());
  picture.onPick(pointer => { tabs.select('form'); form.highlight(pointer); });
  byId('flow-unit').addEventListener('change', () => {
    if (!state.result) return;
    renderFigures(byId('figures'), state.result, byId('flow-unit').value);
    markStale();
  });
  byId('file-open').addEventListener('click', () => byId('file-pick').click());
  byId('file-pick').addEventListener('change', async e => {
    const file = e.target.files?.[0];
    if (file) await openFile(file);
    e.target.value = '';
  });
  editor.onDropFile = openFile;
  wireExports({ state, picture, editor, store, showAlert });
}

// The download buttons: the section as a .section.json file, the picture, the result tables and the memo. Every
// result download is of the analysis shown (state.result); the page says when that is older than the section.

import { byId } from './dom.js';
import { download, svgText, svgToPng, upliftCsv, exitCsv, slug } from './exporter.js';

export function wireExports({ state, picture, editor, store, showAlert }) {
  const name = () => slug(state.result?.title ?? state.section?.title);
  byId('file-save').addEventListener('click', () => {
    const text = editor.text;
    let title;
    try { title = JSON.parse(text)?.title; } catch { title = null; }
    download(new Blob([text], { type: 'application/json' }), `${slug(title ?? state.section?.title)}.section.json`);
    store.opened(text, 'saved file');
  });
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

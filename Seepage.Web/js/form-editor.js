// The structured editor of the common section members: every input is bound to the JSON pointer of one member,
// so the form reads from and writes into the section document and the JSON text stays the one source. Members
// the form does not show (zones, drains, gauges, anything new) pass through untouched.

import { html, clear } from './dom.js';
import { FORM_BLOCKS, NEW_ROWS } from './form-layout.js';

export class FormEditor {
  constructor(container, { onChange, onSelect }) {
    this.container = container;
    this.onChange = onChange;
    this.onSelect = onSelect ?? (() => {});
    this.doc = null;
    container.addEventListener('input', e => { if (e.target.dataset.path) this.emit(); });
    container.addEventListener('change', e => { if (e.target.dataset.path && e.target.tagName === 'SELECT') this.emit(); });
    container.addEventListener('focusin', e => {
      const row = e.target.closest('tr[data-pointer]');
      if (row) this.highlight(row.dataset.pointer);
    });
  }

  /** Shows a section document (a parsed object). */
  show(doc) {
    this.doc = doc;
    clear(this.container);
    if (!doc || typeof doc !== 'object' || Array.isArray(doc)) {
      this.container.append(html('p', { class: 'note' }, 'The section is not a JSON object; edit it in the JSON tab.'));
      return;
    }
    for (const block of FORM_BLOCKS) this.container.append(this.renderBlock(block));
    if (this.selected) this.highlight(this.selected, false);
  }

  /** The section document with every form input written into a copy of the shown one. */
  read() {
    const copy = structuredClone(this.doc);
    for (const input of this.container.querySelectorAll('[data-path]')) writeAt(copy, input.dataset.path, parse(input));
    return copy;
  }

  /** Marks the row of a member (e.g. "/cutoffs/1") and scrolls it into view. */
  highlight(pointer, scroll = true) {
    this.selected = pointer;
    for (const row of this.container.querySelectorAll('tr.selected')) row.classList.remove('selected');
    const row = this.container.querySelector(`tr[data-pointer="${pointer}"]`);
    if (!row) return false;
    row.classList.add('selected');
    if (scroll) row.scrollIntoView({ block: 'nearest' });
    return true;
  }

  emit() {
    this.doc = this.read();
    this.onChange(this.doc);
  }

  renderBlock(block) {
    const parts = [html('h3', {}, block.title)];
    if (block.note) parts.push(html('p', { class: 'note' }, block.note));
    if (block.list) parts.push(this.renderList(block));
    else parts.push(html('div', { class: 'pairs' }, block.fields.flatMap(f => [
      html('label', { for: fieldId(block.at + '/' + f.key) }, f.label),
      input(f, `${block.at}/${f.key}`, valueAt(this.doc, `${block.at}/${f.key}`)),
    ])));
    return html('section', { class: 'form-block', 'data-block': block.list ?? block.at }, parts);
  }

  renderList(block) {
    const items = this.doc[block.list];
    if (items !== undefined && !Array.isArray(items))
      return html('p', { class: 'note' }, `${block.list} is not a list; edit it in the JSON tab.`);
    const rows = (items ?? []).map((item, i) => {
      const at = `/${block.list}/${i}`;
      return html('tr', { 'data-pointer': at },
        block.fields.map(f => html('td', {}, input(f, `${at}/${f.key}`, item?.[f.key]))),
        html('td', {}, html('button', { type: 'button', class: 'button small', title: `Remove this ${block.item}`,
          'aria-label': `Remove ${block.item} ${i + 1}`, onclick: () => this.removeRow(block.list, i) }, '×')));
    });
    const table = html('table', {},
      html('thead', {}, html('tr', {}, block.fields.map(f => html('th', { title: f.hint }, f.label)), html('th', {}, ''))),
      html('tbody', {}, rows));
    const add = html('button', { type: 'button', class: 'button small', 'data-add': block.list,
      onclick: () => this.addRow(block.list) }, `+ ${block.item}`);
    return html('div', {}, html('div', { class: 'wide-table' }, table), add);
  }

  addRow(list) {
    const doc = this.read();
    const items = Array.isArray(doc[list]) ? doc[list] : (doc[list] = []);
    items.push(NEW_ROWS[list](items.length, doc));
    this.show(doc);
    this.onChange(doc);
  }

  removeRow(list, index) {
    const doc = this.read();
    doc[list].splice(index, 1);
    this.show(doc);
    this.onChange(doc);
  }
}

function fieldId(path) { return 'form' + path.replace(/[^A-Za-z0-9]+/g, '-'); }

function input(field, path, value) {
  const common = { 'data-path': path, 'data-kind': field.kind, 'aria-label': `${field.label} (${path})`, title: field.hint };
  if (field.options) {
    const choices = [...field.options];
    const shown = show(field.kind, value);
    if (shown !== '' && !choices.includes(shown)) choices.push(shown);
    const select = html('select', { ...common, id: fieldId(path) },
      html('option', { value: '' }, field.blank ?? '—'), choices.map(c => html('option', { value: c }, c)));
    select.value = shown;
    return select;
  }
  return html('input', { ...common, id: fieldId(path), type: 'text', value: show(field.kind, value), size: field.size ?? 6,
    inputmode: field.kind === 'number' ? 'decimal' : undefined, spellcheck: 'false' });
}

/** Text shown for a value of a kind: numbers as JavaScript writes them, points as "x, y; x, y". */
function show(kind, value) {
  if (value === undefined || value === null) return '';
  if ((kind === 'points' || kind === 'point') && Array.isArray(value)) {
    const one = p => (Array.isArray(p) ? p.map(String).join(', ') : String(p));
    return kind === 'point' ? one(value) : value.map(one).join('; ');
  }
  return typeof value === 'object' ? JSON.stringify(value) : String(value);
}

/** The member value of an input: undefined (member left out) when empty; text that is not of the kind is kept as
 * text, so the service's check names the member rather than the page guessing. */
function parse(input) {
  const text = input.value.trim();
  if (text === '') return undefined;
  switch (input.dataset.kind) {
    case 'number': return numberOr(text);
    case 'bool': return text === 'true' ? true : text === 'false' ? false : text;
    case 'point': return point(text);
    case 'points': return text.split(';').map(p => p.trim()).filter(p => p !== '').map(point);
    default: return text;
  }
}

function point(text) { return text.split(',').map(c => numberOr(c.trim())); }

function numberOr(text) {
  const n = Number(text);
  return text !== '' && Number.isFinite(n) ? n : text;
}

function valueAt(doc, pointer) {
  let v = doc;
  for (const key of pointer.split('/').slice(1)) { if (v === null || typeof v !== 'object') return undefined; v = v[key]; }
  return v;
}

/** Writes (or with undefined, removes) the member at a JSON pointer, creating parent objects only to write. */
function writeAt(doc, pointer, value) {
  const keys = pointer.split('/').slice(1);
  let parent = doc;
  for (const key of keys.slice(0, -1)) {
    if (parent[key] === undefined || parent[key] === null || typeof parent[key] !== 'object') {
      if (value === undefined) return;
      parent[key] = {};
    }
    parent = parent[key];
  }
  const last = keys[keys.length - 1];
  if (value === undefined) delete parent[last];
  else if (JSON.stringify(parent[last]) !== JSON.stringify(value)) parent[last] = value;
}

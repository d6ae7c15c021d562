// Turns validation output (RFC 9457 problem details keyed by JSON pointer, or a JSON syntax error) into a
// readable list of items tied to editor lines.

import { locatePointers, lineOfPointer, normalisePointer, valueAt } from './json-locate.js';

/**
 * Items { pointer, where, messages[], line } from a problem-details body. `text` is the editor text the
 * request was made with; `doc` its parsed form (may be null).
 */
export function problemItems(problem, text, doc) {
  const spots = locatePointers(text);
  const items = [];
  const errors = problem?.errors;
  if (errors && typeof errors === 'object') {
    const entries = Array.isArray(errors)
      ? errors.map(e => [e.pointer ?? e.path ?? '', [e.message ?? e.detail ?? String(e)]])
      : Object.entries(errors);
    for (const [key, messages] of entries) {
      const pointer = normalisePointer(key);
      items.push({
        pointer,
        where: describePointer(pointer, doc),
        messages: Array.isArray(messages) ? messages.map(String) : [String(messages)],
        line: pointer === '' ? null : lineOfPointer(text, spots, pointer),
      });
    }
  }
  if (items.length === 0) {
    items.push({ pointer: '', where: 'section', messages: [problem?.detail || problem?.title || 'The section was rejected.'], line: null });
  }
  items.sort((a, b) => (a.line ?? 1e9) - (b.line ?? 1e9));
  return items;
}

/** An item for a JSON syntax error thrown by JSON.parse on `text`. */
export function syntaxItem(error, text) {
  const m = /line (\d+)/.exec(error.message);
  let line = m ? Number(m[1]) : null;
  if (line === null) {
    const pos = /position (\d+)/.exec(error.message);
    if (pos) line = text.slice(0, Number(pos[1])).split('\n').length;
  }
  return { pointer: '', where: 'JSON syntax', messages: [error.message.replace(/^JSON\.parse: /, '')], line };
}

/** "soils[0] (sand) › kx" from "/soils/0/kx", naming the item by its id or name where it has one. */
export function describePointer(pointer, doc) {
  if (pointer === '') return 'section';
  const parts = pointer.slice(1).split('/');
  let text = '';
  let path = '';
  for (const part of parts) {
    path += '/' + part;
    if (/^\d+$/.test(part)) {
      text += `[${part}]`;
      const item = doc ? valueAt(doc, path) : undefined;
      const label = item && typeof item === 'object' ? (item.id ?? item.name ?? item.soil) : undefined;
      if (typeof label === 'string') text += ` (${label})`;
    } else {
      text += (text ? ' › ' : '') + part.replace(/~1/g, '/').replace(/~0/g, '~');
    }
  }
  return text;
}

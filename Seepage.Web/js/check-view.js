// The list of problems and warnings from the service's check, each pointing at its line of the JSON text.

import { byId, clear, html } from './dom.js';
import { describePointer } from './problems.js';
import { locatePointers, lineOfPointer, normalisePointer, valueAt } from './json-locate.js';

/** Warning items of a check answer, located in the text where the warning names a member. */
export function warningItems(warnings, text, doc) {
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

/** Shows the items and the summary; `goTo(line)` is called when an item is clicked. */
export function showChecks(items, mood, summary, { markLines, goTo }) {
  setCheckState(mood, summary);
  const list = byId('check-list');
  clear(list);
  markLines(items.filter(i => !i.warning).map(i => i.line));
  if (items.length === 0) return;
  list.append(html('ul', {}, items.map(item => html('li', { class: item.warning ? 'warning' : 'problem', 'data-pointer': item.pointer },
    html('button', { type: 'button', onclick: () => item.line && goTo(item.line) },
      html('span', { class: 'where' }, item.where),
      item.line ? html('span', { class: 'line' }, `line ${item.line}`) : null,
      html('br'),
      item.messages.join(' '))))));
}

export function setCheckState(mood, text) {
  const el = byId('check-state');
  el.className = `check-state ${mood}`;
  el.textContent = text;
}

/** The size estimate of the check answer: triangles, unknowns, and a warning when the options multiply it. */
export function showEstimate(estimate) {
  const el = byId('size-estimate');
  el.className = 'estimate';
  if (!estimate) { el.textContent = ''; return; }
  const n = v => Number(v).toLocaleString('en-GB');
  let text = `about ${n(estimate.triangles)} triangles, ${n(estimate.unknowns)} unknowns`;
  if (estimate.multiplier > 1.5) {
    const why = [estimate.order === 2 ? 'order 2' : null, estimate.convergenceCheck ? 'the convergence check' : null].filter(Boolean).join(' and ');
    text += `; ${why} make the largest solve about ${n(estimate.largestSolveUnknowns)} unknowns (×${Math.round(estimate.multiplier)})`;
  }
  if (estimate.largestSolveUnknowns > 1_000_000 || estimate.multiplier >= 16) el.classList.add('large');
  el.textContent = text;
}

// The section JSON editor: a textarea with a line-number gutter that marks lines with problems, accepts
// dropped .json files and can jump to a line.

import { byId, clear, html } from './dom.js';

const LINE_HEIGHT = 18; // px, matches .editor-frame in page.css

export class SectionEditor {
  constructor({ onChange }) {
    this.area = byId('editor');
    this.gutter = byId('editor-gutter');
    this.frame = byId('editor-frame');
    this.marks = byId('editor-marks');
    this.onChange = onChange;
    this.badLines = new Set();
    this.focusLineNo = null;
    this.lineCount = 0;
    this.area.addEventListener('input', () => { this.focusLineNo = null; this.renderGutter(); this.onChange(this.text); });
    this.area.addEventListener('scroll', () => this.syncScroll());
    this.area.addEventListener('keydown', e => this.indentOnTab(e));
    this.wireDrop();
  }

  get text() { return this.area.value; }

  /** Replaces the whole text (an example or an opened file) and notifies the page. */
  setText(text) {
    this.area.value = text;
    this.area.scrollTop = 0;
    this.badLines = new Set();
    this.renderGutter();
    this.onChange(text);
  }

  /** Replaces the text written by the form, keeping the scroll position and without notifying the page. */
  replaceText(text) {
    const top = this.area.scrollTop;
    this.area.value = text;
    this.area.scrollTop = top;
    this.renderGutter();
  }

  /** Marks 1-based lines that have problems. */
  markLines(lines) {
    this.badLines = new Set(lines.filter(l => l !== null && l !== undefined));
    this.renderGutter();
  }

  /** Puts the caret on a 1-based line, selects it and scrolls it into view. */
  goToLine(line) {
    const lines = this.area.value.split('\n');
    const n = Math.min(Math.max(1, line), lines.length);
    let start = 0;
    for (let k = 0; k < n - 1; k++) start += lines[k].length + 1;
    this.area.focus();
    this.area.setSelectionRange(start, start + lines[n - 1].length);
    this.area.scrollTop = Math.max(0, (n - 4) * LINE_HEIGHT);
    this.focusLineNo = n;
    this.renderGutter();
  }

  renderGutter() {
    const count = this.area.value.split('\n').length;
    clear(this.gutter);
    for (let k = 1; k <= count; k++) {
      const cls = k === this.focusLineNo ? 'focus' : this.badLines.has(k) ? 'bad' : undefined;
      this.gutter.append(html('div', { class: cls, 'data-line': k }, String(k)));
    }
    this.gutter.append(html('div', {}, ' '), html('div', {}, ' '));
    // Bands behind the text on the same lines (the textarea is transparent).
    clear(this.marks);
    for (const k of new Set([...this.badLines, this.focusLineNo].filter(Boolean))) {
      this.marks.append(html('div', { class: k === this.focusLineNo ? 'focus' : 'bad', style: `top:${(k - 1) * LINE_HEIGHT}px` }));
    }
    this.syncScroll();
  }

  syncScroll() {
    this.gutter.scrollTop = this.area.scrollTop;
    this.marks.style.transform = `translateY(${-this.area.scrollTop}px)`;
  }

  indentOnTab(e) {
    if (e.key !== 'Tab' || e.shiftKey || e.ctrlKey || e.altKey || e.metaKey) return;
    // Tab inserts two spaces; Escape then Tab leaves the editor (keyboard users keep a way out).
    if (this.escaped) { this.escaped = false; return; }
    e.preventDefault();
    this.area.setRangeText('  ', this.area.selectionStart, this.area.selectionEnd, 'end');
    this.area.dispatchEvent(new Event('input'));
  }

  wireDrop() {
    this.area.addEventListener('keyup', e => { if (e.key === 'Escape') this.escaped = true; });
    const on = e => { e.preventDefault(); this.frame.classList.add('dragging'); };
    const off = () => this.frame.classList.remove('dragging');
    this.frame.addEventListener('dragenter', on);
    this.frame.addEventListener('dragover', on);
    this.frame.addEventListener('dragleave', off);
    this.frame.addEventListener('drop', async e => {
      e.preventDefault();
      off();
      const file = e.dataTransfer?.files?.[0];
      if (file && this.onDropFile) await this.onDropFile(file);
      else if (file) this.setText(await file.text());
    });
  }
}

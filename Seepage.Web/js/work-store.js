// Keeps the working section safe: the text is written to the browser's local storage on every edit, so a reload
// or a closed tab does not lose it, and the page knows whether there are edits not yet saved to a file.

const KEY = 'seepage.bench.working-section';

export class WorkStore {
  constructor(storage = safeStorage()) {
    this.storage = storage;
    this.baseline = null;  // text as last opened or saved (an example, a file, a save)
    this.origin = '';
  }

  /** The section kept from an earlier visit: { text, origin, savedAt, baseline }, or null. */
  restore() {
    try {
      const kept = JSON.parse(this.storage?.getItem(KEY) ?? 'null');
      return kept && typeof kept.text === 'string' ? kept : null;
    } catch { return null; }
  }

  /** A section was opened (example or file) or saved: its text is the new baseline. */
  opened(text, origin) {
    this.baseline = text;
    this.origin = origin;
    this.keep(text);
  }

  /** The editor text changed. */
  keep(text) {
    try {
      this.storage?.setItem(KEY, JSON.stringify({ text, origin: this.origin, baseline: this.baseline, savedAt: new Date().toISOString() }));
    } catch { /* storage full or refused: the page still works, only the reload safety is lost */ }
  }

  /** Whether `text` differs from what was last opened or saved. */
  isDirty(text) { return this.baseline !== null && text !== this.baseline; }
}

function safeStorage() {
  try { return window.localStorage; } catch { return null; }
}

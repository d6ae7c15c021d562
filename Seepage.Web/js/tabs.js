// The tabs of the side panel (form, JSON, all figures, plots): buttons #tab-NAME show panels #panel-NAME.

import { byId } from './dom.js';

export class Tabs {
  constructor(names, onSelect = () => {}) {
    this.names = names;
    this.onSelect = onSelect;
    for (const name of names) byId(`tab-${name}`).addEventListener('click', () => this.select(name));
    byId(`tab-${names[0]}`).parentElement.addEventListener('keydown', e => {
      const step = { ArrowRight: 1, ArrowLeft: -1 }[e.key];
      if (!step) return;
      const next = this.names[(this.names.indexOf(this.current) + step + this.names.length) % this.names.length];
      this.select(next);
      byId(`tab-${next}`).focus();
    });
    this.select(names[0]);
  }

  select(name) {
    this.current = name;
    for (const n of this.names) {
      const on = n === name;
      byId(`tab-${n}`).setAttribute('aria-selected', String(on));
      byId(`tab-${n}`).tabIndex = on ? 0 : -1;
      byId(`panel-${n}`).hidden = !on;
    }
    this.onSelect(name);
  }
}

// Composes the picture from the section and (when there is one) the analysis field, and runs the hover
// readout. Layer visibility follows the toolbar check boxes.

import { clear, html } from './dom.js';
import { fixed, sig } from './format.js';
import { sectionBounds, drawSoilFill, drawZoneOutlines, drawFeatures, drawSoilKey } from './section-view.js';
import { drawUnconfined } from './unconfined-view.js';
import { headRange, drawHeadFill, drawMesh, drawEquipotentials, drawFlowLines, drawWalls, drawExitMarker, drawHeadLegend } from './field-view.js';
import { FieldProbe } from './probe.js';
import { drawVelocityArrows } from './arrows.js';
import { focusBounds } from './focus.js';

export class Scene {
  constructor(picture, { probeEl, flowNetEl, toggles }) {
    this.picture = picture;
    this.probeEl = probeEl;
    this.flowNetEl = flowNetEl;
    this.toggles = toggles;
    this.section = null;
    this.field = null;
    this.result = null;
    this.boundsKey = '';
    for (const box of Object.values(toggles)) box.addEventListener('change', () => this.draw());
    picture.root.addEventListener('pointermove', e => this.readout(e));
    picture.onResize(() => this.draw());
    picture.root.addEventListener('pointerleave', () => { this.probeEl.textContent = this.idleText(); });
  }

  /** Shows a section alone (preview before analysis, or after an edit). */
  showSection(section) {
    this.section = section;
    this.field = null;
    this.result = null;
    this.probe = null;
    this.draw();
  }

  /** Shows an analysis: the section it was run on, its result document and its field data. */
  showAnalysis(section, result, field) {
    this.section = section;
    this.result = result;
    this.field = field;
    this.probe = new FieldProbe(field);
    this.draw();
  }

  draw() {
    const p = this.picture;
    const section = this.section;
    p.clearLayers();
    if (!section) return;
    const bounds = sectionBounds(section);
    const key = JSON.stringify(bounds);
    const field = this.field;
    if (key !== this.boundsKey) { this.boundsKey = key; p.setBounds(bounds); }
    const focus = focusBounds(section, field, bounds);
    const focusKey = JSON.stringify(focus) + (field ? 'field' : '');
    if (focusKey !== this.focusKey) { this.focusKey = focusKey; p.setFocus(focus); }
    const t = this.toggles;
    const range = field ? headRange(field) : null;
    if (field && t.fill.checked) drawHeadFill(p.layers.fill, field, range);
    else drawSoilFill(p.layers.fill, section);
    if (field && t.mesh.checked) drawMesh(p.layers.mesh, field);
    if (field && t.arrows.checked) drawVelocityArrows(p.layers.mesh, section, field, this.probe, bounds);
    drawZoneOutlines(p.layers.outline, section);
    if (field) {
      drawEquipotentials(p.layers.equipotentials, p.layers.contourLabels, field);
      drawFlowLines(p.layers.flowlines, field);
    }
    p.layers.equipotentials.setAttribute('display', t.equipotentials.checked ? 'inline' : 'none');
    p.layers.contourLabels.setAttribute('display', t.equipotentials.checked ? 'inline' : 'none');
    p.layers.flowlines.setAttribute('display', t.flowlines.checked ? 'inline' : 'none');
    drawFeatures(p.layers.features, p.layers.labels, section, bounds);
    if (field) drawWalls(p.layers.features, field);
    if (this.result) drawExitMarker(p.layers.features, p.layers.labels, this.result.exit);
    if (field && t.fill.checked) drawHeadLegend(p.legend, range, p.size.innerH);
    else drawSoilKey(p.legend, section);
    p.applyView();
    this.renderFlowNet();
    if (field?.unconfined) drawUnconfined(p.layers.features, this.flowNetEl, field, section);
    this.probeEl.textContent = this.idleText();
  }

  renderFlowNet() {
    clear(this.flowNetEl);
    const net = this.field?.flowNet;
    if (!net) return;
    // The caption is the service's (the memo prints the same words); an older stored field has none.
    const caption = net.caption ?? `Flow net: Nf = ${net.flowChannels} flow channels, Nd = ${net.headDrops} head drops, ` +
      `shape factor Nf/Nd = ${fixed(net.shapeFactor, 3)}, H = ${fixed(net.headDifference, 2)} m.`;
    this.flowNetEl.append(html('p', { id: 'flow-net-counts', 'data-nf': net.flowChannelsExact ?? net.flowChannels, 'data-nd': net.headDrops },
      caption));
  }

  idleText() {
    return this.field
      ? 'Move over the section for x, y, total head, pore pressure and gradient.'
      : 'Move over the section for x and y. Analyse it for heads and gradients.';
  }

  readout(e) {
    if (!this.section) return;
    const w = this.picture.worldAt(e);
    if (!w) return;
    const parts = [`x = ${fixed(w.x, 2)} m`, `y = ${fixed(w.y, 2)} m`];
    const hit = this.probe?.at(w.x, w.y);
    if (hit) {
      const gammaW = this.field.waterUnitWeight ?? this.section.waterUnitWeight;
      const zoneIndex = this.field.zones?.[hit.triangle];
      const soil = this.field.zoneSoils?.[zoneIndex] ?? this.section.zones?.[zoneIndex]?.soil;
      parts.push(`h = ${fixed(hit.head, 3)} m`,
        Number.isFinite(gammaW) ? `u = γw(h − y) = ${fixed(gammaW * (hit.head - w.y), 1)} kPa`
          : 'u: re-run the analysis (γw not stored with it)',
        `|i| = ${sig(Math.hypot(hit.gradX, hit.gradY), 3)}`,
        `i up = ${sig(-hit.gradY, 3)}`);
      if (soil) parts.push(`soil ${soil}`);
      if (this.field.unconfined && hit.head < w.y) parts.push('unsaturated: negative pore pressure above the phreatic surface');
    } else if (this.probe) {
      parts.push('outside the mesh');
    }
    this.probeEl.textContent = parts.join('  ·  ');
  }
}

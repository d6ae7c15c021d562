// Unconfined sections: draws the server's phreatic surface, the seepage faces and the unsaturated soil (triangles whose
// relative conductivity the server set below one half), and writes a legend saying what each is. Nothing is computed
// here; the flow net the server sent is already limited to the saturated soil.

import { svg, html, pathData, round } from './dom.js';

const PHREATIC = '#0a3d8f', FACE = '#c2410c', DRAIN = '#2a9d4a';

/** Draws the unconfined layers into the world-space layer and a legend into the HTML container. */
export function drawUnconfined(layer, legendBox, field, section) {
  const u = field.unconfined;
  if (!u) return;
  const { nodes } = field;
  const dry = [];
  field.triangles.forEach(([a, b, c], k) => {
    if (u.relativeConductivity[k] >= 0.5) return;
    dry.push(`M${round(nodes[a][0])} ${round(-nodes[a][1])}L${round(nodes[b][0])} ${round(-nodes[b][1])}L${round(nodes[c][0])} ${round(-nodes[c][1])}Z`);
  });
  if (dry.length) layer.append(svg('path', { class: 'unsaturated', d: dry.join(''), fill: '#ffffff', 'fill-opacity': 0.55, stroke: 'none' },
    svg('title', {}, 'unsaturated soil above the phreatic surface (negative pore pressure, no flow)')));
  for (const face of section.seepageFaces ?? []) {
    layer.append(svg('path', { class: 'seepage-face', d: pathData(face.along), fill: 'none', stroke: FACE, 'stroke-width': 4,
      'stroke-dasharray': '8 5', 'vector-effect': 'non-scaling-stroke' }, svg('title', {}, `seepage face ${face.name ?? ''}`)));
  }
  for (const line of u.phreaticSurface ?? []) {
    layer.append(svg('path', { class: 'phreatic', d: pathData(line), fill: 'none', stroke: PHREATIC, 'stroke-width': 3,
      'vector-effect': 'non-scaling-stroke' }, svg('title', {}, 'phreatic surface: pore pressure zero')));
  }
  legendBox.append(html('p', { id: 'unconfined-legend' },
    html('strong', {}, 'Unconfined flow: '),
    swatch(PHREATIC, 'solid'), ' phreatic surface (pore pressure zero) · ',
    swatch(FACE, 'dashed'), ' potential seepage face (water leaves where it is wetted) · ',
    swatch(DRAIN, 'solid'), ' drain · pale soil: unsaturated, above the surface, no flow net drawn there.'));
}

function swatch(colour, style) {
  return html('span', { class: 'unconfined-swatch', style: `display:inline-block;width:22px;border-top:3px ${style} ${colour};vertical-align:middle` });
}

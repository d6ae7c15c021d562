// Styles embedded in the picture SVG itself, so a downloaded SVG or PNG looks like the screen.

export const PICTURE_STYLE = `
svg { font-family: "DejaVu Sans", system-ui, sans-serif; }
.frame { fill: none; stroke: #8c877c; stroke-width: 1; }
.tick text, .legend text { font-size: 11px; fill: #333; }
.tick line { stroke: #8c877c; stroke-width: 1; }
.axis-title { font-size: 11px; fill: #333; }
.world * { vector-effect: non-scaling-stroke; }
.soil-fill { stroke: #ffffff; stroke-opacity: 0.001; }
.head-fill path { stroke-width: 0.7; stroke-linejoin: round; }
.zone-outline { fill: none; stroke: #5c584f; stroke-width: 0.9; }
.mesh { fill: none; stroke: #1e1e1e; stroke-opacity: 0.35; stroke-width: 0.5; }
.equipotential-casing { fill: none; stroke: #ffffff; stroke-opacity: 0.7; stroke-width: 3; }
.equipotential { fill: none; stroke: #161616; stroke-opacity: 0.9; stroke-width: 1.1; }
.flow-line-casing { fill: none; stroke: #0d1c33; stroke-opacity: 0.55; stroke-width: 2.8; }
.flow-line { fill: none; stroke: #ffffff; stroke-width: 1.3; }
.velocity { fill: none; stroke: #0d1c33; stroke-width: 1.1; stroke-linecap: round; stroke-linejoin: round; }
.structure { fill: url(#concrete); stroke: #37342f; stroke-width: 1.2; }
.structure-base { fill: none; stroke: #37342f; stroke-width: 2.5; }
.wall-casing { fill: none; stroke: #ffffff; stroke-width: 7; stroke-linecap: round; }
.wall { fill: none; stroke: #111111; stroke-width: 4; stroke-linecap: round; }
.wall-thick { fill: #7a6f66; fill-opacity: 0.45; stroke: #111; stroke-width: 1.5; stroke-dasharray: 5 3; }
.head-boundary { fill: none; stroke: #1f6fd1; stroke-width: 5; stroke-linecap: butt; }
.water-level { fill: none; stroke: #1f6fd1; stroke-width: 1.5; stroke-dasharray: 7 4; }
.drain { fill: none; stroke: #0f8a7e; stroke-width: 5; stroke-dasharray: 3 3; }
.exit-surface { pointer-events: none; fill: none; stroke: #d0407f; stroke-width: 3; stroke-opacity: 0.9; }
.exit-marker { fill: #d0407f; stroke: #ffffff; stroke-width: 1.5; }
.labels text { font-size: 12px; fill: #111; paint-order: stroke; stroke: #ffffff; stroke-width: 3px; stroke-linejoin: round; }
.contourLabels text { font-size: 10px; fill: #222; }
.world .field-wall { pointer-events: none; }
.world [data-pointer].selected { stroke: #f2a900; }
.labels text.water { fill: #0f4d99; }
.labels text.exit { fill: #9b1f57; }
`;

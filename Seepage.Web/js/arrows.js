// Velocity arrows on demand: on a regular grid over the section, the Darcy velocity v = −K·grad h that the
// server computed for the triangle under each grid point (field.velocities, m/s). Nothing is computed here.

import { svg, round } from './dom.js';

/** Draws arrows into `layer`; length ∝ sqrt(|v| / max |v|) so slow regions stay visible. */
export function drawVelocityArrows(layer, section, field, probe, bounds, count = 46) {
  const w = bounds.maxX - bounds.minX, h = bounds.maxY - bounds.minY;
  const step = Math.max(w, h) / count;
  const samples = [];
  for (let x = bounds.minX + step / 2; x < bounds.maxX; x += step) {
    for (let y = bounds.minY + step / 2; y < bounds.maxY; y += step) {
      const hit = probe.at(x, y);
      if (!hit) continue;
      const v = field.velocities?.[hit.triangle];
      if (!v) continue;
      const [vx, vy] = v;
      const speed = Math.hypot(vx, vy);
      if (speed > 0) samples.push({ x, y, vx, vy, speed });
    }
  }
  const top = Math.max(...samples.map(s => s.speed));
  let d = '';
  for (const s of samples) {
    const len = step * 0.85 * Math.sqrt(s.speed / top);
    if (len < step * 0.08) continue;
    const ux = s.vx / s.speed, uy = s.vy / s.speed;
    const x0 = s.x - ux * len / 2, y0 = s.y - uy * len / 2, x1 = s.x + ux * len / 2, y1 = s.y + uy * len / 2;
    const head = Math.min(len * 0.4, step * 0.25);
    const a = [x1 - head * (ux * 0.87 - uy * 0.5), y1 - head * (uy * 0.87 + ux * 0.5)];
    const b = [x1 - head * (ux * 0.87 + uy * 0.5), y1 - head * (uy * 0.87 - ux * 0.5)];
    d += `M${round(x0)} ${round(-y0)}L${round(x1)} ${round(-y1)}M${round(a[0])} ${round(-a[1])}L${round(x1)} ${round(-y1)}L${round(b[0])} ${round(-b[1])}`;
  }
  layer.append(svg('path', { class: 'velocity', d }));
  return samples.length;
}

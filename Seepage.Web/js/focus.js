// The region "Fit" frames: the structures and cutoffs, and (after an analysis) where the head changes — nodes
// whose total head lies more than 8 % of the head difference away from both the highest and the lowest head.
// Beyond that the section is only the truncated far field; "Whole" shows it.

const SETTLED = 0.08;

/** Focus rectangle in metres { minX, maxX, minY, maxY }, or null when the section has nothing to frame. */
export function focusBounds(section, field, bounds) {
  const xs = [], ys = [];
  const add = p => { if (Array.isArray(p) && Number.isFinite(p[0]) && Number.isFinite(p[1])) { xs.push(p[0]); ys.push(p[1]); } };
  for (const s of list(section.structures)) list(s.base).forEach(add);
  for (const c of list(section.cutoffs)) { add(c.top); add(c.tip); }
  if (field?.nodes?.length && field.heads?.length) {
    let lo = Infinity, hi = -Infinity;
    for (const h of field.heads) { if (h < lo) lo = h; if (h > hi) hi = h; }
    const margin = (hi - lo) * SETTLED;
    field.heads.forEach((h, i) => { if (h > lo + margin && h < hi - margin) add(field.nodes[i]); });
  }
  if (xs.length === 0) return null;
  // Water levels stay in view: the y range of the head totals.
  for (const h of list(section.heads)) if (Number.isFinite(h.total)) ys.push(h.total);
  let minX = Math.min(...xs), maxX = Math.max(...xs), minY = Math.min(...ys), maxY = Math.max(...ys);
  const padX = Math.max((maxX - minX) * 0.12, (bounds.maxX - bounds.minX) * 0.03);
  const padY = Math.max((maxY - minY) * 0.12, (bounds.maxY - bounds.minY) * 0.03);
  minX = Math.max(bounds.minX, minX - padX); maxX = Math.min(bounds.maxX, maxX + padX);
  // The top keeps room for the water-level labels.
  minY = Math.max(bounds.minY, minY - padY); maxY = Math.min(bounds.maxY, maxY + padY) + padY;
  if (!(maxX > minX) || !(maxY > minY)) return null;
  return { minX, maxX, minY, maxY };
}

function list(v) { return Array.isArray(v) ? v : []; }

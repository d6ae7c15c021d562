// The members of a section a study can vary, named as an engineer would name them ("tip elevation of the cutoff
// 'downstream pile'") with the JSON pointer the study endpoint takes. Only numbers the section already has.

/** [{ pointer, label, value }] of the numeric members of a section document worth varying. */
export function studyMembers(doc) {
  const out = [];
  const add = (pointer, label, value) => { if (Number.isFinite(value)) out.push({ pointer, label, value }); };
  list(doc.heads).forEach((h, i) => add(`/heads/${i}/total`, `total head of '${h.name ?? `head ${i + 1}`}' (m)`, h.total));
  list(doc.cutoffs).forEach((c, i) => {
    const name = c.name ?? `cutoff ${i + 1}`;
    if (Array.isArray(c.tip)) add(`/cutoffs/${i}/tip/1`, `tip elevation of '${name}' (m)`, c.tip[1]);
    if (Array.isArray(c.top)) add(`/cutoffs/${i}/top/0`, `x of the top of '${name}' (m)`, c.top[0]);
    if (Array.isArray(c.tip)) add(`/cutoffs/${i}/tip/0`, `x of the tip of '${name}' (m)`, c.tip[0]);
  });
  const unit = doc.conductivityUnit ?? 'm/s';
  list(doc.soils).forEach((s, i) => {
    const name = s.id ?? `soil ${i + 1}`;
    add(`/soils/${i}/kx`, `kx of '${name}' (${unit})`, s.kx);
    add(`/soils/${i}/ky`, `ky of '${name}' (${unit})`, s.ky);
    add(`/soils/${i}/specificGravity`, `Gs of '${name}'`, s.specificGravity);
    add(`/soils/${i}/voidRatio`, `void ratio of '${name}'`, s.voidRatio);
  });
  add('/exitCheck/depth', 'exit check averaging depth (m)', doc.exitCheck?.depth);
  add('/exitCheck/requiredFactor', 'required factor against piping', doc.exitCheck?.requiredFactor);
  add('/heaveCheck/requiredFactor', 'required factor against heave', doc.heaveCheck?.requiredFactor);
  add('/mesh/size', 'mesh size (m)', doc.mesh?.size);
  add('/waterUnitWeight', 'unit weight of water (kN/m³)', doc.waterUnitWeight);
  return out;
}

function list(v) { return Array.isArray(v) ? v : []; }

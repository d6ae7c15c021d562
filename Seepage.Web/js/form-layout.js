// What the structured editor shows: blocks of the section document, the members in each, their kinds, and the
// new rows that "+" adds. Names are the section document's own members (README, "The section document").

// Creep classes of the hand creep checks (Lane 1935, Bligh 1910), as the service's creep tables name them.
const CREEP_CLASSES = ['very-fine-sand-or-silt', 'fine-sand', 'medium-sand', 'coarse-sand', 'fine-gravel', 'medium-gravel',
  'coarse-gravel', 'boulders', 'soft-clay', 'medium-clay', 'hard-clay', 'very-hard-clay'];
const CONDUCTIVITY_UNITS = ['m/s', 'cm/s', 'm/day', 'ft/day', 'ft/min'];
const YES_NO = ['true', 'false'];

const num = (key, label, hint, size = 6) => ({ key, label, hint, kind: 'number', size });
const text = (key, label, hint, size = 10) => ({ key, label, hint, kind: 'text', size });
const pts = (key, label, hint) => ({ key, label, hint: `${hint} — points as "x, y; x, y" in m`, kind: 'points', size: 22 });
const pt = (key, label, hint) => ({ key, label, hint: `${hint} — "x, y" in m`, kind: 'point', size: 8 });

export const FORM_BLOCKS = [
  { title: 'Section', at: '', fields: [
    text('title', 'title', 'Title of the section', 24),
    { key: 'conductivityUnit', label: 'k unit', hint: 'Unit of kx, ky (default m/s)', kind: 'text', options: CONDUCTIVITY_UNITS, blank: 'm/s (default)' },
    { key: 'lengthUnit', label: 'length unit', hint: 'Unit of every coordinate, size and depth (default m)', kind: 'text', options: ['m', 'ft'], blank: 'm (default)' },
    { key: 'unitWeightUnit', label: 'γ unit', hint: 'Unit of the unit weights (default kN/m³)', kind: 'text', options: ['kN/m3', 'pcf'], blank: 'kN/m3 (default)' },
    num('waterUnitWeight', 'γw', 'Unit weight of water in the γ unit, default 9.81 kN/m³'),
    num('structureLength', 'length (m)', 'Length of the structure along its axis, for the total flow'),
  ] },
  { title: 'Soils', list: 'soils', item: 'soil', fields: [
    text('id', 'id', 'Name the zones refer to', 9),
    num('kx', 'kx', 'Conductivity along the bedding, in the k unit'),
    num('ky', 'ky', 'Conductivity across the bedding (default kx)'),
    num('beddingAngle', 'bedding °', 'Bedding angle, degrees counter-clockwise from +x', 4),
    num('specificGravity', 'Gs', 'Specific gravity of the solids (for the critical gradient)', 4),
    num('voidRatio', 'e', 'Void ratio (for the critical gradient)', 4),
    num('saturatedUnitWeight', 'γsat', 'Saturated unit weight, kN/m³ (optional)', 4),
    { key: 'creepClass', label: 'creep class', hint: 'Soil class of the creep tables (Lane 1935, Bligh 1910)', kind: 'text', options: CREEP_CLASSES },
  ] },
  { title: 'Heads', list: 'heads', item: 'head', fields: [
    text('name', 'name', 'Name of the boundary', 9),
    num('total', 'total head (m)', 'Fixed total head, m'),
    pts('along', 'along', 'Boundary polyline'),
  ] },
  { title: 'Structures', list: 'structures', item: 'structure', fields: [
    text('name', 'name', 'Name of the structure', 9),
    pts('base', 'base', 'Where the impervious structure meets the soil'),
  ] },
  { title: 'Cutoffs', list: 'cutoffs', item: 'cutoff', fields: [
    text('name', 'name', 'Name of the cutoff', 9),
    pt('top', 'top', 'Top of the wall'),
    pt('tip', 'tip', 'Tip of the wall'),
    num('thickness', 'thickness (m)', 'With kx: a permeable wall of this thickness', 4),
    num('kx', 'kx', 'Conductivity of a permeable wall, in the k unit', 5),
  ] },
  { title: 'Exit gradient check', at: '/exitCheck', fields: [
    { ...pts('along', 'exit surface', 'Exit surface (default: the tailwater boundary)'), size: 20 },
    num('depth', 'depth (m)', 'Depth over which the upward gradient is averaged (default 0.5 m)'),
    num('requiredFactor', 'required factor', 'Required factor of safety against piping (default 3.0)'),
  ] },
  { title: 'Heave check', at: '/heaveCheck', fields: [
    num('requiredFactor', 'required factor', 'Required factor of safety against heave (default 1.5)'),
  ] },
  { title: 'Mesh', at: '/mesh', fields: [
    num('size', 'size (m)', 'Target edge length'),
    num('minAngle', 'min angle (°)', 'Smallest triangle angle (default 28°)'),
    { key: 'order', label: 'order', hint: '1 linear (default) or 2 quadratic triangles', kind: 'number', options: ['1', '2'], blank: '1 (default)' },
    { key: 'convergenceCheck', label: 'convergence check', hint: 'Two refined solves with error estimates', kind: 'bool', options: YES_NO, blank: 'false (default)' },
  ] },
  { title: 'Flow net', at: '/flowNet', note: 'Head drops Nd: leave empty to have them chosen for square cells and at least four flow channels.', fields: [
    num('headDrops', 'head drops Nd', 'Whole number 2 … 60'),
  ] },
  { title: 'Memo title block', at: '/titleBlock', fields: [
    text('project', 'project', 'Project name printed on the memo'),
    text('jobNumber', 'job number', 'Job number'),
    text('preparedBy', 'prepared by', 'Initials or name'),
    text('checkedBy', 'checked by', 'Initials or name'),
    text('revision', 'revision', 'Revision'),
  ] },
];

/** New rows added by "+": placed at the left of the section so they can be moved from there. */
export const NEW_ROWS = {
  soils: n => ({ id: `soil-${n + 1}`, kx: 1e-5 }),
  heads: n => ({ name: `head ${n + 1}`, along: [[0, 0], [1, 0]], total: 0 }),
  structures: n => ({ name: `structure ${n + 1}`, base: [[0, 0], [1, 0]] }),
  cutoffs: n => ({ name: `cutoff ${n + 1}`, top: [0, 0], tip: [0, -1] }),
};

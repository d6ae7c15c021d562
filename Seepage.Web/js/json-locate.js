// Finds where each value of a JSON text starts, keyed by RFC 6901 JSON pointer, so that messages about
// "/soils/0/kx" can point at a line of the editor. Tolerant: on a syntax error it returns what it found.

/** Map from JSON pointer to { start, end, keyStart } character offsets in `text`. */
export function locatePointers(text) {
  const spots = new Map();
  let i = 0;

  const skip = () => { while (i < text.length && /\s/.test(text[i])) i++; };
  const fail = () => { throw new SyntaxError('stop'); };

  function value(pointer, keyStart) {
    skip();
    const start = i;
    const c = text[i];
    if (c === '{') object(pointer);
    else if (c === '[') array(pointer);
    else if (c === '"') string();
    else if (c === undefined) fail();
    else { while (i < text.length && /[^,\]}\s]/.test(text[i])) i++; if (i === start) fail(); }
    spots.set(pointer, { start, end: i, keyStart: keyStart ?? start });
  }

  function string() {
    i++;
    while (i < text.length && text[i] !== '"') i += text[i] === '\\' ? 2 : 1;
    if (i >= text.length) fail();
    i++;
  }

  function object(pointer) {
    spots.set(pointer, { start: i, end: i, keyStart: i });
    i++; skip();
    if (text[i] === '}') { i++; return; }
    for (;;) {
      skip();
      if (text[i] !== '"') fail();
      const keyStart = i;
      string();
      const key = JSON.parse(text.slice(keyStart, i));
      skip();
      if (text[i] !== ':') fail();
      i++;
      value(`${pointer}/${escape(key)}`, keyStart);
      skip();
      if (text[i] === ',') { i++; continue; }
      if (text[i] === '}') { i++; return; }
      fail();
    }
  }

  function array(pointer) {
    spots.set(pointer, { start: i, end: i, keyStart: i });
    i++; skip();
    if (text[i] === ']') { i++; return; }
    for (let n = 0; ; n++) {
      value(`${pointer}/${n}`);
      skip();
      if (text[i] === ',') { i++; continue; }
      if (text[i] === ']') { i++; return; }
      fail();
    }
  }

  try { value(''); } catch (e) { if (!(e instanceof SyntaxError)) throw e; }
  return spots;
}

function escape(key) {
  return key.replace(/~/g, '~0').replace(/\//g, '~1');
}

/** Turns "$.soils[0].kx", "soils[0].kx" or "/soils/0/kx" into the JSON pointer "/soils/0/kx". */
export function normalisePointer(key) {
  if (key === '' || key === '/' || key === '$') return '';
  if (key.startsWith('/')) return key;
  const parts = key.replace(/^\$\.?/, '').split(/\.|\[(\d+)\]/).filter(p => p !== undefined && p !== '');
  return parts.map(p => '/' + escape(lowerFirst(p))).join('');
}

function lowerFirst(p) {
  return /^\d+$/.test(p) ? p : p[0].toLowerCase() + p.slice(1);
}

/** The 1-based line of the nearest located ancestor of `pointer` (the key's line), or null. */
export function lineOfPointer(text, spots, pointer) {
  let p = pointer;
  for (;;) {
    const spot = spots.get(p);
    if (spot) return lineAt(text, spot.keyStart);
    if (p === '') return null;
    p = p.slice(0, p.lastIndexOf('/'));
  }
}

/** 1-based line number of a character offset. */
export function lineAt(text, offset) {
  let line = 1;
  for (let k = 0; k < offset && k < text.length; k++) if (text.charCodeAt(k) === 10) line++;
  return line;
}

/** Value at a JSON pointer inside a parsed document, or undefined. */
export function valueAt(doc, pointer) {
  if (pointer === '') return doc;
  let v = doc;
  for (const raw of pointer.slice(1).split('/')) {
    const key = raw.replace(/~1/g, '/').replace(/~0/g, '~');
    if (v === null || typeof v !== 'object' || !(key in v)) return undefined;
    v = v[key];
  }
  return v;
}

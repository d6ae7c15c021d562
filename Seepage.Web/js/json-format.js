// Pretty-prints a section document for the editor: objects one key per line, but coordinate pairs and
// short lists of numbers kept on one line so polygons stay readable.

const INLINE_LIMIT = 100; // characters

/** JSON text of `value` indented by two spaces, with short arrays of primitives inline. */
export function formatJson(value, indent = '') {
  if (Array.isArray(value)) {
    if (value.length === 0) return '[]';
    if (value.every(isFlat)) {
      const inline = '[' + value.map(v => (Array.isArray(v) ? '[' + v.map(x => JSON.stringify(x)).join(', ') + ']' : JSON.stringify(v))).join(', ') + ']';
      if (inline.length + indent.length <= INLINE_LIMIT) return inline;
    }
    const inner = indent + '  ';
    return '[\n' + value.map(v => inner + formatJson(v, inner)).join(',\n') + '\n' + indent + ']';
  }
  if (value !== null && typeof value === 'object') {
    const keys = Object.keys(value);
    if (keys.length === 0) return '{}';
    const inner = indent + '  ';
    return '{\n' + keys.map(k => `${inner}${JSON.stringify(k)}: ${formatJson(value[k], inner)}`).join(',\n') + '\n' + indent + '}';
  }
  return JSON.stringify(value);
}

function isFlat(v) {
  return v === null || typeof v !== 'object' || (Array.isArray(v) && v.every(x => x === null || typeof x !== 'object'));
}

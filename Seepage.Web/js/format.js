// Number formatting for figures and readouts. Units are always written by the caller beside the value.

const SUPERSCRIPT = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/** Formats with `digits` significant figures; switches to a × 10ⁿ form outside 1e-3 … 1e6. */
export function sig(value, digits = 3) {
  if (value === null || value === undefined || Number.isNaN(value)) return '—';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : '−∞';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e-3 && abs < 1e6) {
    const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(abs)));
    return minus(value.toFixed(Math.min(decimals, 8)));
  }
  const [mantissa, exponent] = value.toExponential(digits - 1).split('e');
  const power = String(Number(exponent)).split('').map(c => SUPERSCRIPT[c]).join('');
  return `${minus(mantissa)} × 10${power}`;
}

/** Fixed decimals with a true minus sign. */
export function fixed(value, decimals = 2) {
  if (value === null || value === undefined || Number.isNaN(value)) return '—';
  return minus(value.toFixed(decimals));
}

function minus(text) {
  return text.replace(/^-/, '−');
}

/** Plain machine-readable form for CSV files (full precision, ASCII). */
export function csvNumber(value) {
  return value === null || value === undefined ? '' : String(value);
}

/** Parses a number written by `sig` or `fixed` back to a double (used by tests and the readout). */
export function parseShown(text) {
  const t = text.replace(/−/g, '-').trim();
  const m = t.match(/^(-?[\d.]+)(?:\s*×\s*10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+))?/);
  if (!m) return NaN;
  if (!m[2]) return Number(m[1]);
  const digits = { '⁻': '-', '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9' };
  const exponent = Number(m[2].split('').map(c => digits[c]).join(''));
  return Number(m[1]) * Math.pow(10, exponent);
}

// Client-side downloads: the picture as SVG or PNG, station tables as CSV, the result as JSON.

import { csvNumber } from './format.js';

/** Offers `blob` as a file download named `name`. */
export function download(blob, name) {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** Standalone SVG text of an <svg> element. */
export function svgText(svgElement) {
  return '<?xml version="1.0" encoding="UTF-8"?>\n' + new XMLSerializer().serializeToString(svgElement);
}

/** Rasterises an <svg> element (with width/height attributes) to a PNG blob at `pixelRatio`. */
export async function svgToPng(svgElement, pixelRatio = 2) {
  const width = Number(svgElement.getAttribute('width'));
  const height = Number(svgElement.getAttribute('height'));
  const url = URL.createObjectURL(new Blob([svgText(svgElement)], { type: 'image/svg+xml' }));
  try {
    const image = new Image();
    image.decoding = 'sync';
    await new Promise((resolve, reject) => {
      image.onload = resolve;
      image.onerror = () => reject(new Error('the picture could not be rasterised'));
      image.src = url;
    });
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(width * pixelRatio);
    canvas.height = Math.round(height * pixelRatio);
    const ctx = canvas.getContext('2d');
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, canvas.width, canvas.height);
    ctx.drawImage(image, 0, 0, canvas.width, canvas.height);
    return await new Promise(resolve => canvas.toBlob(resolve, 'image/png'));
  } finally {
    URL.revokeObjectURL(url);
  }
}

/** CSV of the uplift stations of every structure. */
export function upliftCsv(result) {
  const lines = ['structure,x_m,y_m,total_head_m,pore_pressure_kPa'];
  for (const u of result.uplift ?? []) {
    for (const s of u.stations) lines.push([quote(u.structure), s.x, s.y, s.head, s.pressure].map(csvNumber).join(','));
  }
  return lines.join('\n') + '\n';
}

/** CSV of the exit gradient profile. */
export function exitCsv(result) {
  const lines = ['x_m,upward_gradient'];
  for (const p of result.exit?.profile ?? []) lines.push([p.x, p.gradient].map(csvNumber).join(','));
  return lines.join('\n') + '\n';
}

/** A file-name-safe slug of a title. */
export function slug(text) {
  return (text || 'section').toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'section';
}

// Text that a spreadsheet would read as a formula (=, +, -, @, tab, CR first) gets a leading apostrophe (OWASP,
// "CSV Injection"); numbers are written by csvNumber and stay numbers.
function quote(text) {
  let t = String(text);
  if (/^[=+\-@\t\r]/.test(t) && !Number.isFinite(Number(t))) t = `'${t}`;
  return /[",\r\n]/.test(t) ? `"${t.replace(/"/g, '""')}"` : t;
}

// The head colour scale: a ramp of our own, built in the OKLab colour space (Ottosson 2020, "A perceptual
// color space for image processing") with lightness rising linearly from dark indigo to pale straw, so equal
// steps in head read as equal steps in lightness and the picture survives grey-scale printing.

const STOPS = [
  // t, lightness L, chroma C, hue h (degrees)
  [0.00, 0.27, 0.11, 288],
  [0.35, 0.52, 0.10, 235],
  [0.65, 0.72, 0.12, 160],
  [1.00, 0.95, 0.12, 98],
];

const LUT_SIZE = 256;
const LUT = Array.from({ length: LUT_SIZE }, (_, i) => oklchToHex(...lchAt(i / (LUT_SIZE - 1))));

/** Colour (#rrggbb) for t in [0, 1]; values outside are clamped. */
export function rampColour(t) {
  const i = Math.round(Math.min(1, Math.max(0, t)) * (LUT_SIZE - 1));
  return LUT[i];
}

/** Number of distinct colours used for the head fill (one SVG path per colour). */
export const RAMP_STEPS = 48;

function lchAt(t) {
  let k = 0;
  while (k < STOPS.length - 2 && t > STOPS[k + 1][0]) k++;
  const [t0, l0, c0, h0] = STOPS[k];
  const [t1, l1, c1, h1] = STOPS[k + 1];
  const s = (t - t0) / (t1 - t0);
  const L = STOPS[0][1] + (STOPS[STOPS.length - 1][1] - STOPS[0][1]) * t; // lightness linear in t
  return [L, c0 + (c1 - c0) * s, h0 + (h1 - h0) * s];
}

function oklchToHex(L, C, hDeg) {
  // Reduce chroma until the colour fits the sRGB gamut.
  for (let c = C; c >= 0; c -= 0.005) {
    const rgb = oklabToSrgb(L, c * Math.cos(hDeg * Math.PI / 180), c * Math.sin(hDeg * Math.PI / 180));
    if (rgb.every(v => v >= -1e-4 && v <= 1 + 1e-4)) return toHex(rgb);
  }
  return toHex(oklabToSrgb(L, 0, 0));
}

function oklabToSrgb(L, a, b) {
  const l = (L + 0.3963377774 * a + 0.2158037573 * b) ** 3;
  const m = (L - 0.1055613458 * a - 0.0638541728 * b) ** 3;
  const s = (L - 0.0894841775 * a - 1.2914855480 * b) ** 3;
  const linear = [
    4.0767416621 * l - 3.3077115913 * m + 0.2309699292 * s,
    -1.2684380046 * l + 2.6097574011 * m - 0.3413193965 * s,
    -0.0041960863 * l - 0.7034186147 * m + 1.7076147010 * s,
  ];
  return linear.map(v => (v <= 0.0031308 ? 12.92 * v : 1.055 * Math.pow(v, 1 / 2.4) - 0.055));
}

function toHex(rgb) {
  return '#' + rgb.map(v => Math.round(Math.min(1, Math.max(0, v)) * 255).toString(16).padStart(2, '0')).join('');
}

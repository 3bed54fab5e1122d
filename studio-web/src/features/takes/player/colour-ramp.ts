// The heat map's colour ramp: cool slate at rest, through teal and amber, to warm white at the
// largest offset. The same stops feed the vertex colours and the legend's CSS gradient.

/** Ramp stops: position 0–1 and an sRGB colour (0–255). */
export const RAMP_STOPS: readonly { at: number; rgb: readonly [number, number, number] }[] = [
  { at: 0, rgb: [38, 52, 72] },
  { at: 0.35, rgb: [40, 128, 124] },
  { at: 0.7, rgb: [222, 160, 52] },
  { at: 1, rgb: [255, 241, 210] },
];

const srgbToLinear = (c: number) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);

// 256 linear-light entries, built once: vertex colours are linear in three.js.
const TABLE = (() => {
  const out = new Float32Array(256 * 3);
  for (let i = 0; i < 256; i++) {
    const [r, g, b] = rampSrgb(i / 255);
    out[3 * i] = srgbToLinear(r / 255);
    out[3 * i + 1] = srgbToLinear(g / 255);
    out[3 * i + 2] = srgbToLinear(b / 255);
  }
  return out;
})();

/** The ramp's sRGB colour (0–255) at `t` (clamped to 0–1). */
export function rampSrgb(t: number): [number, number, number] {
  const x = Math.min(1, Math.max(0, Number.isFinite(t) ? t : 0));
  let i = 1;
  while (i < RAMP_STOPS.length - 1 && RAMP_STOPS[i].at < x) i++;
  const a = RAMP_STOPS[i - 1];
  const b = RAMP_STOPS[i];
  const f = (x - a.at) / (b.at - a.at);
  return [0, 1, 2].map((c) => Math.round(a.rgb[c] + (b.rgb[c] - a.rgb[c]) * f)) as [
    number,
    number,
    number,
  ];
}

/** Writes the linear-light ramp colour at `t` into `out` at `offset` (3 floats). */
export function rampLinearInto(t: number, out: Float32Array, offset: number): void {
  const i = Math.round(Math.min(1, Math.max(0, t || 0)) * 255) * 3;
  out[offset] = TABLE[i];
  out[offset + 1] = TABLE[i + 1];
  out[offset + 2] = TABLE[i + 2];
}

/** The ramp as a CSS linear-gradient towards `direction`. */
export function rampCssGradient(direction = 'to right'): string {
  const stops = RAMP_STOPS.map((s) => `rgb(${s.rgb.join(' ')}) ${Math.round(s.at * 100)}%`);
  return `linear-gradient(${direction}, ${stops.join(', ')})`;
}

/** The smallest "nice" number (1, 2, 2.5 or 5 × 10ⁿ) at or above `value`; 1 for nothing. */
export function niceCeil(value: number): number {
  if (!(value > 0) || !Number.isFinite(value)) return 1;
  const power = 10 ** Math.floor(Math.log10(value));
  for (const step of [1, 2, 2.5, 5, 10])
    if (step * power >= value * (1 - 1e-9)) return step * power;
  return 10 * power;
}

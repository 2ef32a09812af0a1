/**
 * Colour by temperature: a ramp of our own from cold (deep blue) through teal and ochre to hot
 * (brick red), interpolated in sRGB. Chosen to stay distinguishable when printed in colour and to
 * keep neighbouring isotherms apart; the legend always shows it with temperatures.
 */
const RAMP: [number, number, number][] = [
  [0x25, 0x3a, 0x8c],
  [0x1f, 0x8a, 0x9e],
  [0x5c, 0xa8, 0x4a],
  [0xd9, 0x9a, 0x1e],
  [0xc2, 0x4b, 0x1f],
  [0x7a, 0x1c, 0x1c],
];

/** Colour at position t in [0, 1] (clamped) as `#rrggbb`. */
export function rampColour(t: number): string {
  const u = Math.min(1, Math.max(0, Number.isFinite(t) ? t : 0)) * (RAMP.length - 1);
  const i = Math.min(RAMP.length - 2, Math.floor(u));
  const f = u - i;
  const rgb = RAMP[i].map((c, k) => Math.round(c + f * (RAMP[i + 1][k] - c)));
  return `#${rgb.map((c) => c.toString(16).padStart(2, '0')).join('')}`;
}

/** Colour of a temperature within [minK, maxK] (the middle colour when the range is empty). */
export function temperatureColour(temperatureK: number, minK: number, maxK: number): string {
  return rampColour(maxK > minK ? (temperatureK - minK) / (maxK - minK) : 0.5);
}

/** Gradient stops for the colour-bar legend, offsets 0–1. */
export function rampStops(count = 11): { offset: number; colour: string }[] {
  return Array.from({ length: count }, (_, i) => {
    const offset = i / (count - 1);
    return { offset, colour: rampColour(offset) };
  });
}

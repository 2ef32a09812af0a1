/**
 * One colour per temperature, the same in every plot and in the report: the ramp of
 * core/report/svg/colour.ts (cold blue → hot brick red) over the dataset's temperature range.
 */
import { rampStops, temperatureColour } from '@core/report';
import { extent } from '@core/data';

export interface TemperatureScale {
  colour(temperatureK: number): string;
  minK: number;
  maxK: number;
  /** CSS linear-gradient for the colour bar. */
  gradient: string;
}

export function temperatureScale(temperaturesK: readonly number[]): TemperatureScale {
  const [minK, maxK] = temperaturesK.length ? extent(temperaturesK) : [0, 0];
  const stops = rampStops(9)
    .map((s) => `${s.colour} ${(s.offset * 100).toFixed(0)}%`)
    .join(', ');
  return {
    colour: (t) => temperatureColour(t, minK, maxK),
    minK,
    maxK,
    gradient: `linear-gradient(to right, ${stops})`,
  };
}

/** `#rrggbb` with an alpha, for fills and masked points. */
export function withAlpha(hex: string, alpha: number): string {
  const a = Math.round(Math.min(1, Math.max(0, alpha)) * 255)
    .toString(16)
    .padStart(2, '0');
  return `${hex}${a}`;
}

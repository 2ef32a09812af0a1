/**
 * What every plot of isotherms shares: the temperature colour bar, and how an isotherm's state
 * shows — used isotherms in full colour, excluded and left-out ones faded (never hidden) with
 * the reason on hover.
 */
import type { Dataset } from '@core/data';
import type { IsothermState } from '@core/pipeline';
import { toCelsius } from '@core/pipeline';
import type { PlotSeries, PlotSpec } from '../plot-spec';
import { temperatureScale, type TemperatureScale } from '../temperature-colours';

export function datasetScale(dataset: Dataset): TemperatureScale {
  return temperatureScale(dataset.isotherms.map((i) => i.temperatureK));
}

export function colourBar(scale: TemperatureScale): NonNullable<PlotSpec['colourBar']> {
  return { minC: toCelsius(scale.minK), maxC: toCelsius(scale.maxK), gradient: scale.gradient };
}

/** Label suffix and hover note of an isotherm that is not used. */
export function stateMarks(
  state: Pick<IsothermState, 'use' | 'description'> | undefined,
): Pick<PlotSeries, 'faint' | 'note'> & { suffix: string } {
  if (!state || state.use === 'used') return { suffix: '' };
  return {
    faint: true,
    note: state.description,
    suffix: state.use === 'excluded' ? ' (excluded)' : ' (left out)',
  };
}

export const statesById = (states: readonly IsothermState[] = []): Map<string, IsothermState> =>
  new Map(states.map((s) => [s.isothermId, s]));

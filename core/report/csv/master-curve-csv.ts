/** The master curve at Tref as CSV: reduced abscissa, reduced quantities, each point's source. */
import type { Analysis } from '../../pipeline/types';
import type { QuantityId } from '../../data/types';
import { QUANTITY_IDS } from '../../data/types';
import { quantitySymbol } from '../../data/quantities';
import { conventionCommentLines } from '../../pipeline/conventions';
import { toCelsius, toKelvinText } from '../../pipeline/temperature';
import { csvDocument, csvNumber } from './csv-format';
import {
  outputUnitLabel,
  toOutputFrequency,
  toOutputUnit,
  type FrequencyUnit,
  type ModulusUnit,
} from '../../units/output-units';

const COLUMN_STEM: Record<QuantityId, string> = {
  storageModulus: 'storage_modulus',
  lossModulus: 'loss_modulus',
  tanDelta: 'tan_delta',
  phaseAngle: 'phase_angle',
  complexModulus: 'complex_modulus',
  complexViscosity: 'complex_viscosity',
  relaxationModulus: 'relaxation_modulus',
  creepCompliance: 'creep_compliance',
};

/** Column name of a quantity with its unit, e.g. `storage_modulus_MPa`, `phase_angle_deg`. */
export function quantityColumn(q: QuantityId, unit: ModulusUnit): string {
  const u = outputUnitLabel(q, unit).replace('·', '_').replace('/', 'per_').replace('°', 'deg');
  return u ? `${COLUMN_STEM[q]}_${u}` : COLUMN_STEM[q];
}

/**
 * `frequencyUnit` 'Hz' writes the reduced frequency as aT·f with f = ω/2π
 * (`reduced_frequency_Hz`); 'rad/s' (the default) as aT·ω.
 */
export function masterCurveCsv(
  a: Analysis,
  unit: ModulusUnit = 'Pa',
  frequencyUnit: FrequencyUnit = 'rad/s',
): string {
  const mc = a.masterCurve;
  const qs = QUANTITY_IDS.filter((q) => mc.quantities[q] !== undefined);
  const freq = a.sample.abscissa === 'angularFrequency';
  const hz = freq && frequencyUnit === 'Hz';
  const xCol = !freq
    ? 'reduced_time_s'
    : hz
      ? 'reduced_frequency_Hz'
      : 'reduced_frequency_rad_per_s';
  const xMeaning = !freq ? 't/aT' : hz ? 'aT·f, f = ω/2π' : 'aT·ω';
  return csvDocument(
    [
      `Thermoshift ${a.version} master curve — sample: ${a.sample.name}`,
      `reference temperature: ${toCelsius(a.referenceTemperatureK)} °C (${toKelvinText(a.referenceTemperatureK)} K); ${a.sample.deformation}, ${a.sample.testKind}`,
      `${xCol}: ${xMeaning}; quantities reduced to Tref (moduli × bT)`,
      `symbols (${a.sample.deformation}): ${qs.map((q) => `${COLUMN_STEM[q]} = ${quantitySymbol(q, a.sample.deformation)}`).join(', ')}`,
      ...conventionCommentLines(),
      'source_temperature_C and isotherm: where each point was measured; outlier = yes: flagged by the shift engine and left out of the fits',
    ],
    [
      xCol,
      ...qs.map((q) => quantityColumn(q, unit)),
      'source_temperature_C',
      'isotherm',
      'outlier',
    ],
    mc.reducedX.map((x, i) => [
      csvNumber(freq ? toOutputFrequency(x, frequencyUnit) : x),
      ...qs.map((q) => {
        const v = mc.quantities[q]?.[i];
        return v === null || v === undefined ? '' : csvNumber(toOutputUnit(q, v, unit));
      }),
      csvNumber(toCelsius(mc.temperatureK[i])),
      mc.isothermId[i],
      mc.outlier[i] ? 'yes' : 'no',
    ]),
  );
}

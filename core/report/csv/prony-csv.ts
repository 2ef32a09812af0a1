/**
 * Prony terms as CSV for simulation input: τ_i, g_i in the chosen unit, and normalised g_i/G0,
 * with Ge, G0 and the shift model in the header comment (needed to use the series off Tref).
 * Tensile data give tensile terms, named so: E_i, Ee, E0 (columns E_i_<unit>, E_i_over_E0), and
 * the deformation mode is stated on its own line, so nobody enters E-terms as shear terms.
 */
import type { Analysis } from '../../pipeline/types';
import { conventionCommentLines } from '../../pipeline/conventions';
import { toCelsius } from '../../pipeline/temperature';
import { csvDocument, csvNumber } from './csv-format';
import { fittedShiftModels, modelConstant } from '../../pipeline/model-results';
import { modulusFactor, type ModulusUnit } from '../../units/output-units';
import { pronySymbols } from '../../spectrum/prony-symbols';

/** Returns null when the analysis has no Prony series. */
export function pronyCsv(a: Analysis, unit: ModulusUnit = 'Pa'): string | null {
  const p = a.prony;
  if (!p) return null;
  const f = modulusFactor(unit);
  const y = pronySymbols(p.deformation);
  // the physical laws' constants, needed to use the series off Tref (an empirical curve is not listed)
  const shiftModel = fittedShiftModels(a.models)
    .filter((f) => f.descriptor.physical)
    .map((f) => {
      const { descriptor: d, result: m } = f;
      const constants = d.parameters.map((p, i) => {
        const unit = p.csvUnit ?? p.unit;
        return `${d.law.parameters[i].name} = ${csvNumber(modelConstant(f, i).value)}${unit ? ` ${unit}` : ''}`;
      });
      return `shift model ${d.kind}: ${constants.join(', ')}, Tr = ${toCelsius(m.referenceK)} °C (fitted ${toCelsius(m.fittedRangeK[0])}..${toCelsius(m.fittedRangeK[1])} °C)`;
    });
  return csvDocument(
    [
      `Thermoshift ${a.version} Prony series (generalised Maxwell model) — sample: ${a.sample.name}`,
      `deformation: ${y.modeLabel}${p.deformation === 'tension' ? ': tensile moduli E; do not enter them as shear moduli G (E = 2(1 + nu) G, about 3 G for a rubber)' : ': shear moduli G'}`,
      `valid at reference temperature ${toCelsius(a.referenceTemperatureK)} °C; ${y.formulaAscii}; ${y.instantaneous} = ${y.equilibrium} + sum ${y.term}`,
      `${y.equilibrium} (equilibrium modulus) = ${csvNumber(p.equilibriumModulusPa / f)} ${unit} (${p.equilibrium.mode === 'zero' ? 'set to 0' : 'fitted'}: ${p.equilibrium.reason}); ${y.equilibrium}/${y.instantaneous} = ${csvNumber(p.equilibriumModulusPa / p.instantaneousModulusPa)}; ${y.instantaneous} = ${csvNumber(p.instantaneousModulusPa / f)} ${unit}`,
      `fitted to ${p.fittedTo.join(' and ')}, ${p.modesPerDecade} mode(s) per decade, RMS relative error ${csvNumber(p.rmsRelativeError)}, reduced window ${csvNumber(p.reducedWindow[0])}..${csvNumber(p.reducedWindow[1])}`,
      ...shiftModel,
      ...conventionCommentLines(),
    ],
    ['i', 'tau_s', `${y.term}_${unit}`, `${y.term}_over_${y.instantaneous}`],
    p.tauS.map((tau, i) => [
      String(i + 1),
      csvNumber(tau),
      csvNumber(p.modulusPa[i] / f),
      csvNumber(p.modulusPa[i] / p.instantaneousModulusPa),
    ]),
  );
}

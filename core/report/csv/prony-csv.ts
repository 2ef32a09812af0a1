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
import { modulusFactor, type ModulusUnit } from '../../units/output-units';
import { pronySymbols } from '../../spectrum/prony-symbols';

/** Returns null when the analysis has no Prony series. */
export function pronyCsv(a: Analysis, unit: ModulusUnit = 'Pa'): string | null {
  const p = a.prony;
  if (!p) return null;
  const f = modulusFactor(unit);
  const y = pronySymbols(p.deformation);
  const { wlf, arrhenius } = a.models;
  const shiftModel: string[] = [];
  if (wlf)
    shiftModel.push(
      `shift model wlf: C1 = ${csvNumber(wlf.c1)}, C2 = ${csvNumber(wlf.c2K)} K, Tr = ${toCelsius(wlf.referenceK)} °C (fitted ${toCelsius(wlf.fittedRangeK[0])}..${toCelsius(wlf.fittedRangeK[1])} °C)`,
    );
  if (arrhenius)
    shiftModel.push(
      `shift model arrhenius: Ea = ${csvNumber(arrhenius.activationEnergyKJPerMol)} kJ/mol, Tr = ${toCelsius(arrhenius.referenceK)} °C (fitted ${toCelsius(arrhenius.fittedRangeK[0])}..${toCelsius(arrhenius.fittedRangeK[1])} °C)`,
    );
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

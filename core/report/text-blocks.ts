/**
 * Fixed wording of the report: the cautions (docs/conventions.md §6) and the method description, which is
 * assembled from the resolved settings so it states exactly what was done.
 */
import type { Analysis } from '../pipeline/types';
import { quantitySymbol } from '../data/quantities';
import { toCelsius } from '../pipeline/temperature';
import { appliedVertical } from '../pipeline/vertical-at';
import { pronySymbols } from '../spectrum/prony-symbols';
import { fittedShiftModels } from '../pipeline/model-results';

export const CAUTIONS: readonly string[] = [
  'Extrapolation: values outside the measured window of reduced frequency or time, or outside the temperature range the shift model was fitted to, are extrapolations and only estimates. WLF constants fitted above Tg do not hold below Tg.',
  'Validity of superposition: time–temperature superposition holds only for thermorheologically simple materials. Blends, block copolymers, semicrystalline polymers near melting, filled rubbers beyond small strain and samples out of thermal equilibrium often violate it. The checks in this report can miss a failure; a missing warning is not proof.',
  'Linear range: a master curve describes linear viscoelastic behaviour only; the data must come from within the linear viscoelastic range of the material.',
  'Confirm by testing: use these results as engineering estimates. Confirm critical values by tests on the actual material and follow the applicable codes, standards and licensed engineering practice.',
];

/** How the model fits weighted the shifts, in words, from the first fitted model. */
function weightingWords(a: Analysis): string {
  const m = fittedShiftModels(a.models)[0]?.result;
  if (!m) return 'least squares';
  return m.weighting.kind === 'full-covariance'
    ? 'generalised least squares with the full covariance of the shifts from the shift engine (all shifts share the noise of the reference condition)'
    : `weighted least squares (${m.weighting.note})`;
}

export function methodParagraphs(a: Analysis): string[] {
  const s = a.settings;
  const sym = (q: Parameters<typeof quantitySymbol>[0]): string =>
    quantitySymbol(q, a.sample.deformation);
  const mode = appliedVertical(a);
  const why = a.vertical
    ? ` Vertical shift ${a.vertical.requested === 'auto' ? 'chosen automatically' : 'as requested'}: ${a.vertical.reason}.`
    : '';
  const vertical =
    (mode === 'none'
      ? 'No vertical shift was applied (bT = 1).'
      : mode === 'density'
        ? `The vertical shift is the entropic estimate bT = Tref·ρref/(T·ρ(T)) (Ferry 1980) with αV = ${s.density?.volumetricExpansionPerK} 1/K${s.density?.referenceDensityKgPerM3 !== undefined ? ` (ρref = ${s.density.referenceDensityKgPerM3} kg/m³, for the record: bT depends on αV alone)` : ''}.`
        : 'The vertical shift bT was estimated from the data (δ against |G*|, which needs no horizontal shift). Treat large or erratic bT as a sign that superposition fails.') +
    why;
  const xName = a.sample.abscissa === 'angularFrequency' ? 'log ω' : 'log t';
  const paragraphs = [
    `${a.dataset.isotherms.length} isotherms (${a.sample.testKind}, ${a.sample.deformation}) were shifted to the reference temperature ${toCelsius(a.referenceTemperatureK)} °C${s.referenceTemperatureAuto ? ' (chosen automatically: the measured temperature nearest the middle of the range)' : ''}. ` +
      `Horizontal shift factors were found by a global fit of all overlapping pairs of isotherms at once in ${xName}–log space, driven by ${a.shiftQuantities.map(sym).join(' and ')}, with a robust loss against outlying points; each log10 aT has a standard error and each isotherm an RMS residual against the master curve.`,
    vertical,
  ];
  if (s.excludedIsothermIds.length || s.maskedPoints.length)
    paragraphs.push(
      `Left out by the user: ${s.excludedIsothermIds.length} isotherm(s) (${s.excludedIsothermIds.join(', ') || 'none'}) and ${s.maskedPoints.length} point(s).`,
    );
  if (s.models.length)
    paragraphs.push(
      `Shift-factor models (${s.models.join(', ')}) were fitted to log10 aT against temperature by ${weightingWords(a)}; the bands are 95 % confidence bands of the predicted log10 aT (delta method with the constants' covariance). Shifts fixed by hand are not measurements and were left out of these fits.`,
    );
  if (a.prony)
    paragraphs.push(
      `A Prony series (generalised Maxwell model, ${a.prony.deformation}: ${pronySymbols(a.prony.deformation).formula}) with ${a.prony.modesPerDecade} relaxation time(s) per decade across the reduced window (one more decade of short times for the fast tails) was fitted to the master curve, log-binned to ${a.prony.binCount} bin means (${a.prony.pointCount} points), by non-negative least squares on relative residuals weighted by each bin's standard error. ${a.prony.equilibrium.reason}`,
    );
  return paragraphs;
}

/**
 * WLF: log10 aT = −C1 (T − Tr)/(C2 + T − Tr) (Williams, Landel & Ferry, JACS 77, 3701, 1955).
 * Derived: the constants re-referenced to Tg, the apparent activation energy at Tr and the
 * free-volume reading (Ferry, Viscoelastic Properties of Polymers, 3rd ed., 1980, ch. 11).
 */
import { formatCelsius, toCelsius } from '../../data/temperature';
import { fitWlf } from '../fit-wlf';
import { WLF_LAW } from '../shift-laws';
import type { WlfFit } from '../types';
import { wlfApparentActivationEnergyKJPerMol, wlfFreeVolume } from '../wlf-derived';
import { rereferenceWlf } from '../wlf-rereference';
import type { ShiftModelDescriptor } from './descriptor';

/** What WLF adds to its analysis result (core/pipeline `WlfModel`). */
export interface WlfDerived {
  /** Constants re-referenced to Tg when one was given. */
  atGlassTransition?: { c1: number; c2K: number; referenceK: number };
  /** Apparent activation energy at Tref from WLF, kJ/mol. */
  apparentActivationEnergyKJPerMol?: number | null;
  /** Free-volume fraction f_r = B/(2.303·C1) with B = 1, and expansion α_f = f_r/C2 (Ferry 1980). */
  freeVolume?: { fractionalFreeVolume: number; expansionPerK: number } | null;
}

export const wlfModel: ShiftModelDescriptor<WlfFit, WlfDerived> = {
  kind: 'wlf',
  name: 'WLF',
  title: 'WLF',
  law: WLF_LAW,
  parameters: [
    { analysisKey: 'c1', summaryKey: 'C1', unit: '', interval: true },
    { analysisKey: 'c2K', summaryKey: 'C2', unit: 'K', interval: true },
  ],
  physical: true,
  fit: fitWlf,
  formula: {
    text: 'log10 aT = −C1 (T − Tr)/(C2 + T − Tr)',
    ascii: 'log10 aT = -C1 (T - Tr)/(C2 + T - Tr)',
    source: 'Williams, Landel & Ferry 1955',
  },
  readingNote:
    'C1 and C2 are strongly correlated: read the predicted band in the chart rather than the constants alone.',
  validityNote: 'WLF constants fitted above Tg do not hold below Tg',
  // docs/conventions.md §3, §6: WLF does not hold below Tg and has no meaning at or below its pole Tr − C2
  validity(model, temperatureK) {
    const messages: string[] = [];
    const belowGlassTransition =
      model.glassTransitionK !== undefined && temperatureK < model.glassTransitionK;
    if (belowGlassTransition) {
      messages.push(
        `${formatCelsius(temperatureK)} is below Tg (${formatCelsius(model.glassTransitionK!)}): WLF does not hold below the glass transition.`,
      );
    }
    const poleK = model.referenceK - model.values[1];
    const beyondPole = temperatureK <= poleK;
    if (beyondPole) {
      messages.push(
        `${formatCelsius(temperatureK)} is at or below the WLF pole (${formatCelsius(poleK)}): no shift factor exists there.`,
      );
    }
    return { belowGlassTransition, beyondPole, messages };
  },
  chart: {
    colour: '#1d1d1d',
    line: 'solid',
    appColour: '#23676b',
    appLine: 'line',
    residualMarker: 'disc',
  },
  derived: {
    analysis(f, { glassTransitionK }, warn) {
      let atTg: { c1: number; c2K: number; referenceK: number } | undefined;
      if (glassTransitionK !== null)
        try {
          atTg = rereferenceWlf(f.c1, f.c2K, f.referenceK, glassTransitionK);
        } catch (e) {
          warn(e instanceof Error ? e.message : String(e));
        }
      let freeVolume: { fractionalFreeVolume: number; expansionPerK: number } | null = null;
      try {
        freeVolume = wlfFreeVolume(f.c1, f.c2K);
      } catch {
        freeVolume = null; // negative constants: no free-volume reading, the fit itself is reported
      }
      return {
        ...(atTg && { atGlassTransition: atTg }),
        apparentActivationEnergyKJPerMol: wlfApparentActivationEnergyKJPerMol(
          f.referenceK,
          f.c1,
          f.c2K,
          f.referenceK,
        ),
        freeVolume,
      };
    },
    summary(d) {
      return {
        ...(d.atGlassTransition && {
          atGlassTransition: {
            C1: d.atGlassTransition.c1,
            C2: d.atGlassTransition.c2K,
            referenceTemperature: toCelsius(d.atGlassTransition.referenceK),
          },
        }),
        apparentActivationEnergy: d.apparentActivationEnergyKJPerMol ?? null,
        freeVolume: d.freeVolume ?? null,
      };
    },
    rows(d) {
      const rows = [];
      if (d.atGlassTransition)
        rows.push({
          model: 'WLF at Tg',
          constant: 'C1g / C2g',
          values: [d.atGlassTransition.c1, d.atGlassTransition.c2K],
          unit: '– / K',
          reference: { symbol: 'Tg', temperatureK: d.atGlassTransition.referenceK },
        });
      if (d.apparentActivationEnergyKJPerMol != null)
        rows.push({
          model: 'WLF',
          constant: 'apparent Ea at Tr',
          values: [d.apparentActivationEnergyKJPerMol],
          unit: 'kJ/mol',
        });
      return rows;
    },
  },
};

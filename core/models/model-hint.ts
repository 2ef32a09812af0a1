import { WLF_C2_RUNAWAY_K } from './fit-wlf';
import type { ArrheniusFit, PolynomialFit, ShiftModelKind, WlfFit } from './types';

export interface ModelHint {
  recommended: ShiftModelKind;
  /** Sentences explaining the choice, in the order the rule applied them. */
  reasons: string[];
  /** AICc of each model given (lower is better; differences below 2 are not meaningful). */
  aicc: Partial<Record<ShiftModelKind, number>>;
}

/** Window above Tg where WLF is the usual choice, K (common practice; IUPAC 2013 gives Tg..Tg+50 K). */
export const WLF_WINDOW_ABOVE_TG_K = 100;

/**
 * Which shift model suits the data. The rule, in order (documented in docs/models.md):
 * 1. With Tg known: data reaching below Tg → Arrhenius (WLF is not valid below Tg); all data more
 *    than 100 K above Tg → Arrhenius (melt regime); otherwise WLF (its domain, Tg..Tg+100 K).
 * 2. WLF that did not converge or whose C2 ran away is never recommended: Arrhenius instead.
 * 3. Without Tg: WLF only when its AICc beats Arrhenius by more than 2 (one extra constant must
 *    earn its place), else Arrhenius.
 * 4. The polynomial is empirical: recommended only when it beats both laws' AICc by more than 10.
 */
export function suggestShiftModel(
  fits: { wlf?: WlfFit; arrhenius?: ArrheniusFit; polynomial?: PolynomialFit },
  glassTransitionK?: number,
): ModelHint {
  const reasons: string[] = [];
  const aicc: Partial<Record<ShiftModelKind, number>> = {};
  if (fits.wlf) aicc.wlf = fits.wlf.aicc;
  if (fits.arrhenius) aicc.arrhenius = fits.arrhenius.aicc;
  if (fits.polynomial) aicc.polynomial = fits.polynomial.aicc;
  const wlfUsable = !!fits.wlf && fits.wlf.converged && fits.wlf.c2K < WLF_C2_RUNAWAY_K * 0.999;
  if (fits.wlf && !wlfUsable) reasons.push(`The WLF fit is not usable: ${fits.wlf.reason}`);
  let pick: ShiftModelKind | undefined;
  const range = (fits.wlf ?? fits.arrhenius ?? fits.polynomial)?.fittedRangeK;
  if (glassTransitionK !== undefined && range) {
    if (range[0] < glassTransitionK) {
      pick = 'arrhenius';
      reasons.push(
        'Some isotherms lie below Tg, where WLF does not hold; Arrhenius is the usual law there.',
      );
    } else if (range[0] > glassTransitionK + WLF_WINDOW_ABOVE_TG_K) {
      pick = 'arrhenius';
      reasons.push(
        `All isotherms are more than ${WLF_WINDOW_ABOVE_TG_K} K above Tg (melt regime): Arrhenius is the usual law.`,
      );
    } else if (wlfUsable) {
      pick = 'wlf';
      reasons.push(
        `The data lie between Tg and about Tg + ${WLF_WINDOW_ABOVE_TG_K} K, the usual WLF range.`,
      );
    }
  }
  if (!pick) {
    const a = aicc.arrhenius ?? Infinity;
    if (wlfUsable && (aicc.wlf ?? Infinity) < a - 2) {
      pick = 'wlf';
      reasons.push(
        'WLF describes the curvature of log aT clearly better than Arrhenius (AICc lower by more than 2).',
      );
    } else if (fits.arrhenius) {
      pick = 'arrhenius';
      reasons.push('Arrhenius describes the data as well as WLF with one constant fewer.');
    } else {
      pick = wlfUsable ? 'wlf' : 'polynomial';
    }
  }
  const poly = aicc.polynomial;
  const bestLaw = Math.min(
    wlfUsable ? (aicc.wlf ?? Infinity) : Infinity,
    aicc.arrhenius ?? Infinity,
  );
  if (poly !== undefined && poly < bestLaw - 10) {
    pick = 'polynomial';
    reasons.push(
      'Neither physical law fits well; the empirical polynomial does (AICc lower by more than 10). Do not extrapolate it.',
    );
  }
  return { recommended: pick, reasons, aicc };
}

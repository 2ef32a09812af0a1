/** The verdict of one specification criterion for one sample. */
export interface SpecVerdict {
  /** The criterion's name (its id, or one made from its kind). */
  criterion: string;
  kind: string;
  verdict: 'pass' | 'fail' | 'inconclusive';
  /** The difference found (in `unit`); null when it could not be determined. */
  value: number | null;
  /** Its standard error, null when unknown. */
  stdErr: number | null;
  /** The allowed range of the difference, in `unit`. */
  limits: [number, number];
  /** Unit of value, s.e. and limits, e.g. '%', 'decades', 'kJ/mol'. */
  unit: string;
  /**
   * Probability (normal approximation) that the true difference lies outside the limits: high
   * for a clear fail, low for a clear pass; null without an uncertainty.
   */
  probabilityOutside: number | null;
  /** One sentence: what was compared, by how much it missed or met the limit, and how sure. */
  reason: string;
}

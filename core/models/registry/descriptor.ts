/**
 * What a shift model is to every layer: its law, its fit, how its constants are named in the
 * analysis, the summary, the CSV files, the report and the app, its chart style, where it does not
 * hold, and (optionally) quantities derived from it. One object per model, one file per model in
 * this folder; `./index.ts` lists them. docs/architecture.md shows how to add one.
 */
import type {
  ShiftFitCommon,
  ShiftFitOptions,
  ShiftLaw,
  ShiftModelKind,
  ShiftModelSpec,
  ShiftPoint,
} from '../types';

/** How one constant of the law (same order as `law.parameters`) is named in the outputs. */
export interface ShiftModelParameter {
  /**
   * Field of the analysis result: the value under `analysisKey`, its standard error under
   * `${analysisKey}StdErr` and, when `interval`, its 95 % interval under `${analysisKey}Ci95`.
   */
  analysisKey: string;
  /** The same three fields in summary.json, under `summaryKey`, `…StdErr`, `…Ci95`. */
  summaryKey: string;
  /** Unit in tables, the app and the CLI ('' when dimensionless). */
  unit: string;
  /** Unit in the CSV file (ASCII). @default unit */
  csvUnit?: string;
  /** Whether the 95 % interval of the constant is reported. */
  interval: boolean;
}

/** A row of quantities derived from a model, for the report's model table and the app. */
export interface ShiftModelDerivedRow {
  /** Model column, e.g. 'WLF at Tg'. */
  model: string;
  /** Constant column, e.g. 'C1g / C2g'. */
  constant: string;
  /** Values, printed joined by ' / '. */
  values: number[];
  unit: string;
  /** The temperature the values refer to, printed as `symbol = … °C`. */
  reference?: { symbol: string; temperatureK: number };
}

/** Range flags a law adds to the fitted-range check (core/models/range-check.ts). */
export interface ShiftModelValidity {
  belowGlassTransition?: boolean;
  beyondPole?: boolean;
  /** One sentence per raised flag. */
  messages: string[];
}

/**
 * Quantities a model derives from its fit (an optional capability): fields added to the analysis
 * result after the constants and `referenceK`, their summary.json form, and rows for the tables.
 * `D` is the type of the added fields (plain JSON).
 */
export interface ShiftModelDerived<F extends ShiftFitCommon, D extends object> {
  /** The added analysis fields; `warn` records a warning with code `model-<kind>`. */
  analysis(
    fit: F,
    context: { glassTransitionK: number | null },
    warn: (message: string) => void,
  ): D;
  /** The added summary.json fields, after `referenceTemperature`. */
  summary(fields: D): Record<string, unknown>;
  /** Rows after the constants in the report's model table. */
  rows(fields: D): ShiftModelDerivedRow[];
}

/**
 * A shift model. Methods are declared as methods (not function-valued properties) so that a
 * descriptor of a particular fit and derived type can be listed with the others.
 */
export interface ShiftModelDescriptor<
  F extends ShiftFitCommon = ShiftFitCommon,
  D extends object = object,
> {
  /** Registry key: settings, summary.json and CSV files use it (lower case, e.g. 'wlf'). */
  kind: ShiftModelKind;
  /** Name in charts, tables and warnings ('WLF', 'polynomial'). */
  name: string;
  /** Name at the start of a sentence or as a heading ('Polynomial'). */
  title: string;
  /** log10 aT(T; values) and its gradient (the band is the delta method over it). */
  law: ShiftLaw;
  /** Output names of the constants, in the order of `law.parameters`. */
  parameters: readonly ShiftModelParameter[];
  /**
   * A physical law (true) is used for derived answers (the tan δ peak temperature) and is listed
   * in the Prony file's header and the CLI's short result; an empirical curve (false) is read only
   * inside its fitted range.
   */
  physical: boolean;
  /** The fit: generalised least squares on log10 aT with the shift engine's covariance. */
  fit(points: readonly ShiftPoint[], options: ShiftFitOptions): F;
  /** The law in words: `text` for the report (Unicode), `ascii` for CSV headers, `source` cited. */
  formula: { text: string; ascii: string; source?: string };
  /** A sentence on reading the constants (report's model-table note). */
  readingNote?: string;
  /** A clause on where the law does not hold (report and CSV notes). */
  validityNote?: string;
  /** Flags besides the fitted range for using the model at `temperatureK`. */
  validity?(spec: ShiftModelSpec, temperatureK: number): ShiftModelValidity;
  /** Chart styles: report SVG (`colour`, `line`) and the app's plots (`appColour`, `appLine`, residual marker). */
  chart: {
    colour: string;
    line: 'solid' | 'dashed';
    appColour: string;
    appLine: 'line' | 'dashed';
    residualMarker: 'disc' | 'ring';
  };
  /** Quantities derived from the fit (re-referencing, free volume …), when the model has any. */
  derived?: ShiftModelDerived<F, D>;
}

import type { AbscissaKind, DeformationMode, QuantityId, TestKind } from '../data/types';
import { describeConversion, parseUnit } from '../units';
import type { ColumnDraft } from './column-draft';
import { ImportError } from './import-error';
import { ROLE_UNITS, ROLE_WORDS, isFrequency, isQuantity, testKindOf } from './roles';
import { recogniseLayout } from './layouts';
import type { ColumnPlan, ColumnReport } from './types';
import type { WarningSink } from './warning-sink';

export type { ColumnPlan } from './types';

export interface PlanContext {
  file: string;
  headerRow: number;
  testKind: TestKind | 'auto';
  warnings: WarningSink;
  /** "key: value" lines above the table, shown to the layouts' recognisers. @default {} */
  metadata?: Record<string, string>;
}

const HOW_TO_MAP =
  'map the column explicitly (import preview, or `--column` on the command line; see docs/import.md)';

function inferTestKind(drafts: ColumnDraft[], ctx: PlanContext): TestKind {
  if (ctx.testKind !== 'auto') return ctx.testKind;
  const roles = drafts.map((d) => d.role);
  const kinds = new Set(
    roles.filter((r) => r && isQuantity(r)).map((r) => testKindOf(r as QuantityId)),
  );
  const hasFrequency = roles.some((r) => r && isFrequency(r));
  if (kinds.has('oscillatory') && (hasFrequency || kinds.size === 1)) return 'oscillatory';
  if (kinds.has('relaxation')) return 'relaxation';
  if (kinds.has('creep')) return 'creep';
  const pending = drafts.filter((d) => d.role === undefined).map((d) => d.index + 1);
  if (pending.length > 0) {
    throw new ImportError(
      'missingColumn',
      ctx.file,
      ctx.headerRow,
      pending[0],
      `columns ${pending.join(', ')} are headed by temperatures only, so it is not known what they hold. ` +
        `Add a line such as "# quantity: E' [MPa]" above the table, or ${HOW_TO_MAP}.`,
    );
  }
  const seen = drafts.map((d) => `"${d.header}"`).join(', ');
  throw new ImportError(
    'missingColumn',
    ctx.file,
    ctx.headerRow,
    0,
    `no measured quantity was recognised among the headers ${seen}. Name the columns as in ` +
      `"G' (Pa)", "E'' [MPa]", "tan δ", "G(t) (Pa)" or "J(t) (1/Pa)", or ${HOW_TO_MAP}.`,
  );
}

function ignore(d: ColumnDraft, note: string): void {
  d.role = 'ignore';
  d.note = note;
}

function report(d: ColumnDraft, ctx: PlanContext): ColumnReport {
  const role = d.role ?? 'ignore';
  const base = {
    index: d.index + 1,
    header: d.header,
    unitText: d.unitText,
    role,
    recognisedBy: role === 'ignore' && d.by !== 'mapping' ? ('none' as const) : d.by,
    ...(d.deformation ? { deformation: d.deformation } : {}),
    ...(d.temperatureK !== undefined ? { temperatureK: d.temperatureK } : {}),
  };
  if (role === 'ignore') {
    return {
      ...base,
      unit: '',
      siUnit: '',
      factor: 1,
      offset: 0,
      conversion: 'not read',
      ...(d.note ? { note: d.note } : {}),
    };
  }
  const { dimension, defaultUnit } = ROLE_UNITS[role];
  const written = d.unitText.trim();
  const parsed = parseUnit(written || defaultUnit, dimension);
  if (!parsed.ok) {
    throw new ImportError(
      'unknownUnit',
      ctx.file,
      d.unitRow,
      d.index + 1,
      `column "${d.header}" was read as ${ROLE_WORDS[role]}, but its ${parsed.message.replace(/\.$/, '')}. ` +
        `Write the unit in the header, e.g. "${d.name || d.header} (${defaultUnit || '-'})", or ${HOW_TO_MAP}.`,
    );
  }
  const c = parsed.conversion;
  let note = d.note;
  if (!written && role !== 'tanDelta') {
    note = `no unit given; ${defaultUnit} assumed`;
    ctx.warnings.add(
      ctx.headerRow,
      d.index + 1,
      `column "${d.header}" (${ROLE_WORDS[role]}) has no unit; ${defaultUnit} was assumed`,
    );
  }
  if (d.temperatureAssumed) {
    ctx.warnings.add(
      ctx.headerRow,
      d.index + 1,
      `column "${d.header}": temperature without unit; °C was assumed`,
    );
  }
  return {
    ...base,
    unit: c.unit,
    siUnit: c.siUnit,
    factor: c.factor,
    offset: c.offset,
    conversion: describeConversion(c),
    ...(note ? { note } : {}),
  };
}

/**
 * Settles what each column is used for: the test kind (from the quantities found), the abscissa
 * column, the temperature column or per-column temperatures (wide layout), the units and their
 * conversion. Columns that do not fit are ignored with a note; missing essentials and unknown
 * units throw ImportError.
 */
export function planColumns(drafts: ColumnDraft[], ctx: PlanContext): ColumnPlan {
  const testKind = inferTestKind(drafts, ctx);
  const abscissa: AbscissaKind = testKind === 'oscillatory' ? 'angularFrequency' : 'time';
  const isX = (d: ColumnDraft) =>
    abscissa === 'time' ? d.role === 'time' : !!d.role && isFrequency(d.role);
  const x = drafts.find(isX);
  if (!x) {
    const want =
      abscissa === 'time' ? 'time ("Time (s)", "t [min]")' : 'frequency ("f (Hz)", "ω (rad/s)")';
    throw new ImportError(
      'missingColumn',
      ctx.file,
      ctx.headerRow,
      0,
      `this ${testKind} data needs a ${want} column, and none was recognised; name it so, or ${HOW_TO_MAP}.`,
    );
  }
  const wide = drafts.some((d) => d.role && isQuantity(d.role) && d.temperatureK !== undefined);
  let temperature: ColumnDraft | undefined;
  const seen = new Set<string>();
  for (const d of drafts) {
    if (d === x || d.role === undefined || d.role === 'ignore') continue;
    if (d.role === 'temperature') {
      if (wide) ignore(d, 'not used: the temperatures are in the column headers');
      else if (temperature)
        ignore(d, `not used: column ${temperature.index + 1} gives the temperature`);
      else temperature = d;
    } else if (d.role === 'time' || isFrequency(d.role)) {
      ignore(
        d,
        `not used: column ${x.index + 1} is the ${abscissa === 'time' ? 'time' : 'frequency'}`,
      );
    } else if (isQuantity(d.role)) {
      const key = `${d.role}@${d.temperatureK ?? ''}`;
      if (testKindOf(d.role) !== testKind) ignore(d, `not used in ${testKind} data`);
      else if (wide && d.temperatureK === undefined)
        ignore(d, 'not used: no temperature in its header');
      else if (seen.has(key))
        ignore(d, `not used: ${ROLE_WORDS[d.role]} appears in an earlier column`);
      else seen.add(key);
    }
  }
  for (const d of drafts) if (d.role === undefined) ignore(d, 'quantity not known');
  const columns = drafts.map((d) => report(d, ctx));
  const used = drafts.filter((d) => d.role && isQuantity(d.role));
  const modes = new Map<DeformationMode, ColumnDraft>();
  for (const d of used) if (d.deformation) modes.set(d.deformation, d);
  if (modes.size > 1) {
    const s = modes.get('shear')!;
    const t = modes.get('tension')!;
    throw new ImportError(
      'conflict',
      ctx.file,
      ctx.headerRow,
      t.index + 1,
      `column "${s.header}" is a shear quantity but column "${t.header}" a tensile one; ` +
        `one file must hold one deformation mode. Ignore the columns you do not want, or ${HOW_TO_MAP}.`,
    );
  }
  const temperatureColumn = temperature ? temperature.index : -1;
  const quantityColumns = used.map((d) => ({
    column: d.index,
    quantity: d.role as QuantityId,
    ...(d.temperatureK !== undefined ? { temperatureK: d.temperatureK } : {}),
  }));
  const { layout, match } = recogniseLayout({
    file: ctx.file,
    header: drafts.map((d) => d.header),
    metadata: ctx.metadata ?? {},
    columns,
    temperatureColumn,
    quantityColumns,
  });
  return {
    columns,
    layout: layout.id,
    testKind,
    abscissa,
    ...(modes.size === 1 ? { deformation: [...modes.keys()][0] } : {}),
    temperatureColumn,
    xColumn: x.index,
    quantityColumns,
    layoutEvidence: match.evidence,
  };
}

/**
 * zod schema of a Dataset (core/data/types.ts) as stored in an analysis file: checked on load so a
 * damaged or hand-edited file gives a message naming the bad field instead of a broken screen.
 */
import { z } from 'zod';
import { QUANTITY_IDS, type QuantityId } from '../data/types';

const num = z.number().or(z.null().transform(() => Number.NaN));

const isotherm = z
  .object({
    id: z.string().min(1),
    temperatureK: z.number().positive(),
    temperatureSpreadK: z.number().min(0),
    x: z.array(z.number()),
    quantities: z.partialRecord(
      z.enum(QUANTITY_IDS as [QuantityId, ...QuantityId[]]),
      z.array(num),
    ),
    mask: z.array(z.boolean()),
    source: z.array(z.object({ file: z.string(), row: z.number().int() })),
  })
  .superRefine((iso, ctx) => {
    const n = iso.x.length;
    const bad = (what: string, len: number): void =>
      ctx.addIssue({
        code: 'custom',
        message: `isotherm ${iso.id}: ${what} has ${len} values but x has ${n}`,
      });
    if (iso.mask.length !== n) bad('mask', iso.mask.length);
    if (iso.source.length !== n) bad('source', iso.source.length);
    for (const [q, v] of Object.entries(iso.quantities)) if (v && v.length !== n) bad(q, v.length);
  });

export const datasetSchema = z.object({
  name: z.string(),
  testKind: z.enum(['oscillatory', 'relaxation', 'creep']),
  deformation: z.enum(['shear', 'tension']),
  abscissa: z.enum(['angularFrequency', 'time']),
  isotherms: z.array(isotherm).min(1),
  files: z.array(z.string()),
  metadata: z.record(z.string(), z.string()),
});

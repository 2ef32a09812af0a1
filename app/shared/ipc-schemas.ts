/**
 * Validation of every IPC request payload (zod), used by main before a handler runs. A payload
 * from the renderer is untrusted input: sizes are bounded and names cannot carry folders.
 */
import { z } from 'zod';
import type { IpcChannel } from './ipc-channels';

/** Largest text the renderer may ask main to write: 200 MB of characters. */
export const MAX_TEXT_CHARS = 200_000_000;

/** A bare file name: no folder separators, no "..", no control characters. */
export const fileNameSchema = z
  .string()
  .min(1)
  .max(200)
  .refine((s) => !/[/\\]/.test(s) && s !== '.' && s !== '..', 'must be a file name, not a path')
  // eslint-disable-next-line no-control-regex -- rejecting control characters is the point
  .refine((s) => !/[\u0000-\u001f]/.test(s), 'must not contain control characters');

const noPayload = z.undefined();

export const IPC_SCHEMAS = {
  'data-files:open': noPayload,
  'data-folder:open': noPayload,
  'file:save': z
    .object({
      suggestedName: fileNameSchema,
      content: z.string().max(MAX_TEXT_CHARS),
      encoding: z.enum(['utf8', 'base64']),
    })
    .strict(),
  'analysis:open': noPayload,
  'analysis:save': z
    .object({ suggestedName: fileNameSchema, text: z.string().max(MAX_TEXT_CHARS) })
    .strict(),
  'recent:list': noPayload,
  'recent:open': z.object({ id: z.string().regex(/^[a-z0-9-]{1,64}$/) }).strict(),
  'recent:confirm': z.object({ kind: z.enum(['data', 'analysis']) }).strict(),
  'autosave:write': z.object({ text: z.string().max(MAX_TEXT_CHARS) }).strict(),
  'autosave:read': noPayload,
} satisfies Record<IpcChannel, z.ZodType>;

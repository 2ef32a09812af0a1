/**
 * Writes an output set (all files of `build --out DIR`, or a whole `batch --out DIR`) as a whole:
 * every file goes into a hidden staging folder beside DIR (same file system), with a manifest
 * naming each file, its size and SHA-256; only when all are written and flushed is the staging
 * folder swapped in for DIR (two renames: the old set aside, the new one in, the old one removed).
 * A failed write (disk full, permission, a kill mid-write) therefore leaves the earlier set
 * byte-identical and no partial or stale files. If the process dies between the two renames,
 * the next write (or `recoverOutputSet`) puts the old set back before doing anything else.
 * A non-empty DIR that holds no manifest is not ours and is never replaced.
 */
import { createHash, randomBytes } from 'node:crypto';
import {
  existsSync,
  mkdirSync,
  readdirSync,
  readFileSync,
  renameSync,
  rmSync,
  statSync,
} from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';
import { THERMOSHIFT_VERSION } from '@core/pipeline';
import { writeFlushedSync } from '../../shared/flushed-write.ts';

/** The manifest written last into every output set. */
export const MANIFEST_NAME = 'thermoshift-manifest.json';

export interface OutputEntry {
  /** Path inside the set, '/'-separated (e.g. "summary.json" or "sampleA/report.html"). */
  name: string;
  content: string;
}

const STAGING = '.thermoshift-staging-';
const ASIDE = '.thermoshift-previous-';

function prefix(target: string, kind: string): string {
  return `.${basename(target)}${kind}`;
}

/** Undoes an interrupted swap (puts the previous set back) and removes leftover staging folders. */
export function recoverOutputSet(dir: string): void {
  const target = resolve(dir);
  const parent = dirname(target);
  if (!existsSync(parent)) return;
  const names = readdirSync(parent);
  for (const n of names.filter((n) => n.startsWith(prefix(target, ASIDE)))) {
    const aside = join(parent, n);
    if (!existsSync(target)) renameSync(aside, target);
    else rmSync(aside, { recursive: true, force: true });
  }
  for (const n of names.filter((n) => n.startsWith(prefix(target, STAGING))))
    rmSync(join(parent, n), { recursive: true, force: true });
}

/** True when `dir` is an output set Thermoshift wrote (it holds the manifest). */
export function isOutputSet(dir: string): boolean {
  return existsSync(join(dir, MANIFEST_NAME));
}

/**
 * Refuses before any work when DIR cannot receive an output set: DIR is a file, a non-empty
 * folder that is not a Thermoshift output set, or an existing set without `force`.
 */
export function assertOutputSetWritable(dir: string, force: boolean): void {
  recoverOutputSet(dir);
  if (!existsSync(dir)) return;
  if (!statSync(dir).isDirectory())
    throw new CliError(`${dir} is not a folder; --out needs a folder`, EXIT.outputError);
  if (readdirSync(dir).length === 0) return;
  if (!isOutputSet(dir))
    throw new CliError(
      `${dir} is a non-empty folder that Thermoshift did not write (no ${MANIFEST_NAME}); choose a new or empty folder for --out`,
      EXIT.outputError,
    );
  if (!force)
    throw new CliError(
      `${dir} already holds Thermoshift results; use --force to replace them`,
      EXIT.outputError,
    );
}

function writeFlushed(path: string, content: string): void {
  writeFlushedSync(path, Buffer.from(content, 'utf8'));
}

/** Writes the set into `dir` as a whole; returns the paths written (manifest last). */
export function writeOutputSet(
  dir: string,
  entries: OutputEntry[],
  o: { force: boolean },
): string[] {
  assertOutputSetWritable(dir, o.force);
  const target = resolve(dir);
  const parent = dirname(target);
  const tag = `${process.pid}-${randomBytes(4).toString('hex')}`;
  const staging = join(parent, `${prefix(target, STAGING)}${tag}`);
  try {
    mkdirSync(parent, { recursive: true });
    mkdirSync(staging);
    const manifest = {
      schema: 'thermoshift-output-set/1',
      version: THERMOSHIFT_VERSION,
      files: entries.map((e) => ({
        name: e.name,
        bytes: Buffer.byteLength(e.content, 'utf8'),
        sha256: createHash('sha256').update(e.content, 'utf8').digest('hex'),
      })),
    };
    for (const e of entries) {
      const path = join(staging, ...e.name.split('/'));
      mkdirSync(dirname(path), { recursive: true });
      writeFlushed(path, e.content);
    }
    writeFlushed(join(staging, MANIFEST_NAME), `${JSON.stringify(manifest, null, 2)}\n`);
  } catch (e) {
    rmSync(staging, { recursive: true, force: true });
    if (e instanceof CliError) throw e;
    throw new CliError(
      `cannot write the output set ${dir}: ${(e as Error).message}; earlier results are unchanged`,
      EXIT.outputError,
    );
  }
  const aside = join(parent, `${prefix(target, ASIDE)}${tag}`);
  try {
    if (existsSync(target)) renameSync(target, aside);
    renameSync(staging, target);
  } catch (e) {
    recoverOutputSet(dir);
    throw new CliError(
      `cannot put the output set in place at ${dir}: ${(e as Error).message}; earlier results are unchanged`,
      EXIT.outputError,
    );
  }
  rmSync(aside, { recursive: true, force: true });
  return [...entries.map((e) => join(dir, ...e.name.split('/'))), join(dir, MANIFEST_NAME)];
}

/** The manifest of the set in `dir`, or undefined. */
export function readManifest(
  dir: string,
): { files: { name: string; bytes: number; sha256: string }[] } | undefined {
  try {
    return JSON.parse(readFileSync(join(dir, MANIFEST_NAME), 'utf8')) as {
      files: { name: string; bytes: number; sha256: string }[];
    };
  } catch {
    return undefined;
  }
}

/**
 * How the fuzz harness (scripts/fuzz.ts) and its regression test (tests/cli/fuzz-findings.test.ts)
 * run one command and judge the outcome: exit 70 is an internal error, no exit within 30 s a
 * hang, and exit 0 from `build --json` silent nonsense when no curve is included, an included
 * curve has a missing, non-finite or implausible (> 50 decades) shift factor (JSON writes NaN as
 * null), or a missing standard error that no `large-uncertainty` warning tells.
 */
import { spawnSync } from 'node:child_process';

const HANG_MS = 30_000;
const MAX_PLAUSIBLE_SHIFT_DECADES = 50;

export interface CliOutcome {
  status: number | null;
  stdout: string;
  stderr: string;
  hung: boolean;
}

export type Verdict = 'internal' | 'hang' | 'nonsense' | undefined;

export function runCli(
  bin: string,
  args: string[],
): {
  status: number | null;
  stdout: string;
  stderr: string;
  hung: boolean;
} {
  const r = spawnSync(process.execPath, [bin, ...args], {
    encoding: 'utf8',
    timeout: HANG_MS,
    killSignal: 'SIGKILL',
    maxBuffer: 64 * 1024 * 1024,
  });
  const hung = r.error !== undefined && (r.error as NodeJS.ErrnoException).code === 'ETIMEDOUT';
  return { status: r.status, stdout: r.stdout ?? '', stderr: r.stderr ?? '', hung };
}

/** A finite number, or a reason it is not one. */
function badNumber(v: unknown): boolean {
  return typeof v !== 'number' || !Number.isFinite(v);
}

export function judge(command: string, r: CliOutcome): Verdict {
  if (r.hung) return 'hang';
  if (r.status === 70) return 'internal';
  if (r.status !== 0 || command !== 'build') return undefined;
  try {
    const j = JSON.parse(r.stdout) as {
      curves?: {
        isothermId: string;
        included: boolean;
        log10aT: unknown;
        log10aTStdErr: unknown;
      }[];
      warnings?: { code: string; message: string }[];
    };
    const included = (j.curves ?? []).filter((c) => c.included);
    if (included.length === 0) return 'nonsense';
    if (included.some((c) => badNumber(c.log10aT))) return 'nonsense';
    // master curves of real polymers span some 10–30 decades of reduced frequency (common
    // practice); a single shift beyond 50 decades only comes from cells no instrument measured
    if (included.some((c) => Math.abs(c.log10aT as number) > MAX_PLAUSIBLE_SHIFT_DECADES))
      return 'nonsense';
    // an undetermined standard error is honest when a large-uncertainty warning names the isotherm
    const told = (id: string): boolean =>
      (j.warnings ?? []).some((w) => w.code === 'large-uncertainty' && w.message.includes(id));
    if (included.some((c) => badNumber(c.log10aTStdErr) && !told(c.isothermId))) return 'nonsense';
  } catch {
    return 'nonsense'; // exit 0 without readable JSON
  }
  return undefined;
}

/**
 * How the fuzz harness (scripts/fuzz.ts) and its regression test (tests/cli/fuzz-findings.test.ts)
 * run one command and judge the outcome: exit 70 is an internal error, no exit within 30 s a
 * hang, and exit 0 from `build --json` with no included curve or with a missing or non-finite
 * shift factor or standard error on an included curve (JSON writes NaN as null) silent nonsense.
 */
import { spawnSync } from 'node:child_process';

const HANG_MS = 30_000;

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
      curves?: { included: boolean; log10aT: unknown; log10aTStdErr: unknown }[];
    };
    const curves = j.curves ?? [];
    const included = curves.filter((c) => c.included);
    if (included.length === 0) return 'nonsense';
    if (included.some((c) => badNumber(c.log10aT) || badNumber(c.log10aTStdErr))) return 'nonsense';
  } catch {
    return 'nonsense'; // exit 0 without readable JSON
  }
  return undefined;
}

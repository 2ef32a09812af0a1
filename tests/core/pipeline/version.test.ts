import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { THERMOSHIFT_VERSION } from '../../../core/pipeline/version';

describe('THERMOSHIFT_VERSION', () => {
  it('THERMOSHIFT_VERSION equals the version in package.json', () => {
    const pkg = JSON.parse(
      readFileSync(new URL('../../../package.json', import.meta.url), 'utf8'),
    ) as { version: string };
    expect(THERMOSHIFT_VERSION).toBe(pkg.version);
  });
});

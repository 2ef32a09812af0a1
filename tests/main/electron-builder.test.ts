/**
 * The packaging settings in electron-builder.yml, read and validated by electron-builder's own
 * config loader and turned into @electron/fuses options by electron-builder's own code, so the
 * test sees exactly what `npm run dist` flips. app-builder-lib and @electron/fuses are the copies
 * electron-builder itself installs and uses (not separate dependencies that could drift from it).
 */
import { describe, expect, it } from 'vitest';
import { fileURLToPath } from 'node:url';
import { PlatformPackager, type Configuration } from 'app-builder-lib';
import { getConfig, validateConfiguration } from 'app-builder-lib/out/util/config/config.js';
import { DebugLogger } from 'builder-util';
import { FuseV1Options, FuseVersion } from '@electron/fuses';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));

async function builderConfig(): Promise<Configuration> {
  const config = await getConfig(ROOT, 'electron-builder.yml', null);
  await validateConfiguration(config, new DebugLogger(false));
  return config;
}

describe('electron-builder.yml', () => {
  it('electron-builder.yml is valid for electron-builder and packs the app into app.asar', async () => {
    const config = await builderConfig();
    expect(config.asar).toBe(true);
    expect(JSON.stringify(config.files)).toContain('"out/**"');
  });

  it('electron-builder.yml flips the security fuses at packaging', async () => {
    const { electronFuses } = await builderConfig();
    // generateFuseConfig is electron-builder's mapping from the YAML keys to @electron/fuses.
    const toFuses = (
      PlatformPackager.prototype as unknown as {
        generateFuseConfig(f: unknown): Promise<Record<string, unknown>>;
      }
    ).generateFuseConfig;
    const fuses = await toFuses.call({}, electronFuses);
    expect(fuses.version).toBe(FuseVersion.V1);
    const expected: [FuseV1Options, boolean][] = [
      [FuseV1Options.RunAsNode, false],
      [FuseV1Options.EnableCookieEncryption, true],
      [FuseV1Options.EnableNodeOptionsEnvironmentVariable, false],
      [FuseV1Options.EnableNodeCliInspectArguments, false],
      [FuseV1Options.EnableEmbeddedAsarIntegrityValidation, true],
      [FuseV1Options.OnlyLoadAppFromAsar, true],
      [FuseV1Options.GrantFileProtocolExtraPrivileges, false],
    ];
    for (const [fuse, value] of expected) expect(fuses[fuse], FuseV1Options[fuse]).toBe(value);
  });
});

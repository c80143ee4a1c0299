/**
 * electron-builder cannot run here (it downloads Electron), so its configuration is checked against
 * electron-builder's own schema, and the targets the README promises are asserted.
 */
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const require = createRequire(import.meta.url);
interface BuilderConfig {
  linux: { target: string[] };
  win: { target: string[] };
  mac: { target: string[] };
  electronVersion: string;
  extraMetadata: { main: string };
  [key: string]: unknown;
}
const { getConfig, validateConfiguration } = require('app-builder-lib/out/util/config/config') as {
  getConfig(projectDir: string, configPath: string, fromOptions: null): Promise<BuilderConfig>;
  validateConfiguration(config: BuilderConfig, logger: unknown): Promise<void>;
};
const { DebugLogger } = require('builder-util') as { DebugLogger: new (enabled: boolean) => unknown };
const root = process.cwd();
const packageJson = require(join(root, 'package.json')) as {
  optionalDependencies: Record<string, string>;
  main: string;
};

describe('desktop packaging configuration', () => {
  it('passes electron-builder’s schema and names the promised targets', async () => {
    const config = await getConfig(root, join(root, 'electron-builder.yml'), null);
    await expect(validateConfiguration(config, new DebugLogger(false))).resolves.toBeUndefined();
    expect(config.linux.target).toEqual(['AppImage', 'deb']);
    expect(config.win.target).toEqual(['nsis']);
    expect(config.mac.target).toEqual(['dmg']);
    expect(config.electronVersion).toBe(packageJson.optionalDependencies.electron);
    expect(config.extraMetadata.main).toBe(packageJson.main);
  });

  it('flips the Electron fuses that lock the installed app down', async () => {
    // Electron's fuses (https://www.electronjs.org/docs/latest/tutorial/fuses), applied by electron-builder.
    const config = await getConfig(root, join(root, 'electron-builder.yml'), null);
    expect(config.electronFuses).toEqual({
      runAsNode: false,
      enableCookieEncryption: true,
      enableNodeOptionsEnvironmentVariable: false,
      enableNodeCliInspectArguments: false,
      enableEmbeddedAsarIntegrityValidation: true,
      onlyLoadAppFromAsar: true,
      grantFileProtocolExtraPrivileges: false,
    });
    await expect(
      validateConfiguration({ ...config, electronFuses: { runAsNode: 'no' } } as BuilderConfig, new DebugLogger(false)),
    ).rejects.toThrow(/runAsNode/);
  });

  it('the schema check bites on an unknown key', async () => {
    const config = await getConfig(root, join(root, 'electron-builder.yml'), null);
    await expect(
      validateConfiguration(
        { ...config, linux: { ...config.linux, colour: 'teal' } } as BuilderConfig,
        new DebugLogger(false),
      ),
    ).rejects.toThrow(/unknown property/);
  });
});

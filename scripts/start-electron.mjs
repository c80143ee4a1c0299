// `npm start`: builds the renderer and the desktop bundle, makes sure an Electron build of better-sqlite3
// exists beside the Node one (see DEVELOPERS.md, "Two native builds"), then opens the Pairwright window.
import { spawnSync } from 'node:child_process';
import { copyFileSync, cpSync, existsSync, mkdirSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildDesktop } from './build-desktop.mjs';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const require = createRequire(import.meta.url);

function fail(message) {
  console.error(`\npairwright: ${message}\n`);
  process.exit(1);
}

function electronBinary() {
  let electronPackage;
  try {
    // PAIRWRIGHT_ELECTRON_DIR points at another electron package folder (tests use an empty one).
    const override = process.env.PAIRWRIGHT_ELECTRON_DIR;
    electronPackage = override
      ? require.resolve(join(override, 'package.json'))
      : require.resolve('electron/package.json');
  } catch {
    return {
      error:
        'Electron is not installed. It is an optional dependency whose install downloads the Electron binary; that download failed or was skipped on this machine.',
    };
  }
  const pathFile = join(dirname(electronPackage), 'path.txt');
  if (!existsSync(pathFile))
    return {
      error:
        'the electron package is present but its binary was never downloaded (node_modules/electron/path.txt is missing).',
    };
  const binary = join(dirname(electronPackage), 'dist', readFileSync(pathFile, 'utf8').trim());
  if (!existsSync(binary)) return { error: `the Electron binary ${binary} is missing.` };
  const version = JSON.parse(readFileSync(electronPackage, 'utf8')).version;
  return { binary, version };
}

function run(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: 'inherit', cwd: root, ...options });
  return result.status === 0;
}

/** Builds better-sqlite3 for Electron's ABI in .native/, leaving node_modules (the Node build) untouched. */
function ensureElectronSqlite(electronVersion) {
  const target = join(root, 'dist-electron', 'native', 'better_sqlite3.node');
  const workDir = join(root, '.native', `electron-${electronVersion}`, 'better-sqlite3');
  const built = join(workDir, 'build', 'Release', 'better_sqlite3.node');
  if (!existsSync(built)) {
    console.log(`Building better-sqlite3 for Electron ${electronVersion} in ${workDir} (once) …`);
    mkdirSync(dirname(workDir), { recursive: true });
    cpSync(dirname(require.resolve('better-sqlite3/package.json')), workDir, {
      recursive: true,
      filter: (src) => !src.includes(`${join('build', 'Release')}`),
    });
    const prebuilt = run(
      process.execPath,
      [
        require.resolve('prebuild-install/bin.js'),
        '--runtime',
        'electron',
        '--target',
        electronVersion,
        '--arch',
        process.arch,
      ],
      { cwd: workDir },
    );
    if (!prebuilt) {
      const npmCli = process.env.npm_execpath;
      const compiled =
        npmCli &&
        run(
          process.execPath,
          [
            npmCli,
            'exec',
            '--yes',
            '--',
            'node-gyp',
            'rebuild',
            '--release',
            `--target=${electronVersion}`,
            '--runtime=electron',
            '--dist-url=https://electronjs.org/headers',
          ],
          { cwd: workDir },
        );
      if (!compiled || !existsSync(built))
        fail(
          'could not build better-sqlite3 for Electron (no prebuilt binary and node-gyp failed). See the output above.',
        );
    }
  }
  mkdirSync(dirname(target), { recursive: true });
  copyFileSync(built, target);
}

const electron = electronBinary();
if (electron.error) {
  fail(
    `${electron.error}\n` +
      '  On a machine with internet access: npm install (or: npm install electron@40.10.0), then npm start.\n' +
      '  Without Electron you can use the same app in your browser: npm run serve',
  );
}
if (
  !run(process.execPath, [
    join(root, 'node_modules', 'vite', 'bin', 'vite.js'),
    'build',
    '--config',
    'renderer/vite.config.ts',
  ])
)
  fail('the renderer build failed (see above).');
await buildDesktop();
ensureElectronSqlite(electron.version);
const env = { ...process.env };
delete env.ELECTRON_RUN_AS_NODE;
const launched = spawnSync(electron.binary, [join(root, 'dist-electron', 'main.mjs')], {
  stdio: 'inherit',
  cwd: root,
  env,
});
process.exit(launched.status ?? 1);

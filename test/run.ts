import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { exitWith, step } from '../db/lifecycle/console';
import { appSecrets } from '../db/lifecycle/app-secrets';
import { ensureDebianPackage } from '../db/lifecycle/debian';
import { runCommand } from '../db/lifecycle/run-command';
import { withFileLock } from '../db/lifecycle/file-lock';
import { DATA_ROOT, startServers, throwawayRoot } from '../db/lifecycle/servers';
import { onShutdown, shutdown } from '../db/lifecycle/shutdown';

/**
 * `npm test`: a throwaway MariaDB and Redis, migrations and demo data, the web build, then every
 * suite — jest (core, api, db, e2e, browser) and Vitest (web) — and one closing summary line.
 * Arguments after `--` go to jest alone (e.g. `npm test -- --selectProjects e2e`).
 */
async function main(): Promise<number> {
  const jestArgs = process.argv.slice(2);
  const reports = join(throwawayRoot(), 'reports');
  mkdirSync(reports, { recursive: true });

  ensureDebianPackage('chromium', 'chromium', 'the browser tests');
  // One export test opens a workbook in a real spreadsheet program (headless, no desktop).
  ensureDebianPackage('libreoffice', 'libreoffice-calc-nogui', 'the spreadsheet export tests');
  const env = await startServers('throwaway');
  const testEnv = {
    ...env,
    ...appSecrets(false),
    NODE_ENV: 'test',
    LOG_LEVEL: 'warn',
    // Uploads and the demo seed's scans stay inside this run's folder.
    UPLOADS_DIR: join(throwawayRoot(), 'uploads'),
  };

  step('Applying migrations and loading the demo network…');
  await runCommand('npx', ['tsx', 'db/cli.ts', 'migrate'], testEnv, 'Migrations');
  await runCommand('npx', ['tsx', 'db/cli.ts', 'seed'], testEnv, 'Demo seed');
  step('Building core and the web app for the browser tests…');
  await runCommand(
    'npm',
    ['run', '--silent', 'build', '-w', 'packages/core'],
    {},
    'The core build',
  );
  await runCommand('npm', ['run', '--silent', 'build', '-w', 'reports'], {}, 'The reports build');
  // Each run builds into its own folder, so runs side by side never share a half-written build.
  // Outside .data/: Express's sendFile refuses any path with a dot-folder in it (the SPA fallback).
  const webDist = join(tmpdir(), `tallyloom-web-${process.pid}`);
  onShutdown(() => rmSync(webDist, { recursive: true, force: true }));
  await withFileLock(join(DATA_ROOT, 'web-build.lock'), () =>
    runCommand(
      'npm',
      [
        'run',
        '--silent',
        'build',
        '-w',
        'packages/web',
        '--',
        '--outDir',
        webDist,
        '--emptyOutDir',
      ],
      {},
      'The web build',
    ),
  );
  Object.assign(testEnv, { WEB_DIST_DIR: webDist });

  const tally = { passed: 0, failed: 0 };
  const jestReport = join(reports, 'jest.json');
  step('Running jest (core, api, db, e2e, browser)…');
  const jestOk = await runCommand(
    'npx',
    ['jest', '--maxWorkers=2', '--json', `--outputFile=${jestReport}`, ...jestArgs],
    testEnv,
    'jest',
  ).then(
    () => true,
    () => false,
  );
  addCounts(tally, jestReport, jestOk);

  if (jestArgs.length === 0) {
    const vitestReport = join(reports, 'vitest.json');
    step('Running Vitest (web)…');
    const vitestOk = await runCommand(
      'npx',
      [
        'vitest',
        'run',
        '--root',
        'packages/web',
        '--reporter=default',
        '--reporter=json',
        `--outputFile=${vitestReport}`,
      ],
      {},
      'Vitest',
    ).then(
      () => true,
      () => false,
    );
    addCounts(tally, vitestReport, vitestOk);
  }

  await shutdown();
  // The plain closing line CI reads, whatever runners ran.
  process.stdout.write(`\ntests: ${tally.passed} passed, ${tally.failed} failed\n`);
  return tally.failed === 0 && tally.passed > 0 ? 0 : 1;
}

/** Both runners write jest-style JSON: numPassedTests / numFailedTests. */
function addCounts(
  tally: { passed: number; failed: number },
  file: string,
  runnerOk: boolean,
): void {
  if (!existsSync(file)) {
    tally.failed += 1; // the runner died before reporting: count it as a failure, never as silence
    return;
  }
  const report = JSON.parse(readFileSync(file, 'utf8')) as {
    numPassedTests: number;
    numFailedTests: number;
    numRuntimeErrorTestSuites?: number;
  };
  tally.passed += report.numPassedTests;
  tally.failed += report.numFailedTests + (report.numRuntimeErrorTestSuites ?? 0);
  if (!runnerOk && report.numFailedTests === 0 && !report.numRuntimeErrorTestSuites)
    tally.failed += 1;
}

main().then(
  (code) => process.exit(code),
  async (error) => {
    await shutdown();
    exitWith(error);
  },
);

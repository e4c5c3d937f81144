import { appSecrets } from '../../db/lifecycle/app-secrets';
import { LifecycleError, exitWith, step } from '../../db/lifecycle/console';
import { findFreePort } from '../../db/lifecycle/ports';
import { runCommand, startLongRunning, stopLongRunning } from '../../db/lifecycle/run-command';
import { startServers, throwawayRoot, type ServerEnv } from '../../db/lifecycle/servers';
import { join } from 'node:path';
import { onShutdown, shutdown } from '../../db/lifecycle/shutdown';
import { waitForHttp } from '../../db/lifecycle/wait-for-http';
import { DEMO_SIGN_INS } from '../../db/seeders/demo-sign-ins';
import { load } from './load';
import { benchExports } from './exports-bench';
import { benchReports } from './reports-bench';
import { sizeFromArgs, type NetworkSize } from './synthetic-network';

/**
 * `npm run bench`: the production build of the API on throwaway servers, measured as ratios
 * against a baseline taken in the same run, never as absolute times, so figures compare across
 * machines. Later capabilities add their own sections.
 */
async function main(): Promise<void> {
  const seconds = Number(process.env.BENCH_SECONDS ?? 5);
  const connections = Number(process.env.BENCH_CONNECTIONS ?? 20);
  const size = sizeFromArgs(process.argv.slice(2));
  // `--only exports`: the exports section alone, on a synthetic network it generates itself.
  const exportsOnly = process.argv.slice(2).join(' ').includes('--only exports');
  const env = await startServers('throwaway');
  await runCommand('npx', ['tsx', 'db/cli.ts', 'migrate'], env, 'Migrations');
  await runCommand('npx', ['tsx', 'db/cli.ts', 'seed'], env, 'Demo seed');
  step('Building core and API…');
  await runCommand(
    'npm',
    ['run', '--silent', 'build', '-w', 'packages/core'],
    {},
    'The core build',
  );
  await runCommand('npm', ['run', '--silent', 'build', '-w', 'reports'], {}, 'The reports build');
  await runCommand('npm', ['run', '--silent', 'build', '-w', 'services/api'], {}, 'The API build');

  const port = await findFreePort();
  const api = startLongRunning('node', ['services/api/dist/main.js'], {
    ...env,
    ...appSecrets(false),
    NODE_ENV: 'production',
    LOG_LEVEL: 'warn',
    PORT: String(port),
    SERVE_WEB: 'false',
    // The bench signs in once; the throttle is not what is measured.
    SIGN_IN_THROTTLE_PER_MINUTE: '1000',
    // Snapshots are rebuilt by the benchmark itself, timed; no job may rebuild meanwhile.
    JOB_PROCESSORS: 'off',
  });
  let exited = false;
  api.once('exit', () => (exited = true));
  onShutdown(() => stopLongRunning(api));
  const baseUrl = `http://127.0.0.1:${port}`;
  if (!(await waitForHttp(`${baseUrl}/api/health`, 60_000, () => exited))) {
    throw new LifecycleError('The API did not start for the benchmark.');
  }

  // Signed in as national staff: the network routes run the full guard and scope path.
  const staff = DEMO_SIGN_INS.find((person) => person.role === 'national_staff')!;
  const signIn = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: staff.email, password: staff.password }),
  });
  const { accessToken } = (await signIn.json()) as { accessToken: string };
  const auth = { authorization: `Bearer ${accessToken}` };
  if (exportsOnly) return exportsSection(env, staff.email, size);

  step(`Load: ${connections} connections × ${seconds} s per route…`);
  await load(baseUrl, '/api/health', connections, 1); // warm-up
  const baseline = await load(baseUrl, '/api/health', connections, seconds);
  const routes = [
    await load(baseUrl, '/api/regions', connections, seconds, auth),
    await load(baseUrl, '/api/chapters', connections, seconds, auth),
  ];

  const rows = [baseline, ...routes].map((r) => ({
    route: r.path,
    requests: r.requests,
    'p50 ms': r.p50Ms,
    'p95 ms (≤p97.5)': r.p95Ms,
    errors: r.errors,
    'p95 ÷ health p95': (r.p95Ms / Math.max(baseline.p95Ms, 0.001)).toFixed(2),
  }));
  console.table(rows);

  step(
    `Reports on a synthetic network: ${size.regions} regions, ${size.chapters} chapters, ` +
      `${size.months} months, ${size.receiptsPerMonth} receipts per chapter-month…`,
  );
  Object.assign(process.env, env, appSecrets(false), { NODE_ENV: 'production', LOG_LEVEL: 'warn' });
  const reports = await benchReports({
    databaseUrl: env.DATABASE_URL,
    generatorUrl: env.DATABASE_MIGRATION_URL,
    baseUrl,
    auth,
    size,
    connections: Number(process.env.BENCH_REPORT_CONNECTIONS ?? 50),
    seconds,
  });
  console.table(reports.rows);

  await exportsSection(env, staff.email);
}

async function exportsSection(env: ServerEnv, staffEmail: string, generate?: NetworkSize) {
  Object.assign(process.env, env, appSecrets(false), { NODE_ENV: 'production', LOG_LEVEL: 'warn' });
  step('Exports of the synthetic receipts (staff, every column)…');
  const exportRows = await benchExports({
    databaseUrl: env.DATABASE_URL,
    staffEmail,
    sizes: exportSizes(process.argv.slice(2)),
    folder: join(throwawayRoot(), 'bench-exports'),
    generate: generate && { generatorUrl: env.DATABASE_MIGRATION_URL, size: generate },
  });
  console.table(exportRows);
}

/** `--export-sizes 100000,1000000` (the default). */
function exportSizes(args: readonly string[]): number[] {
  const at = args.indexOf('--export-sizes');
  if (at < 0) return [100_000, 1_000_000];
  const sizes = (args[at + 1] ?? '').split(',').map(Number);
  if (sizes.length === 0 || sizes.some((size) => !Number.isInteger(size) || size < 1)) {
    throw new LifecycleError('--export-sizes needs whole numbers separated by commas');
  }
  return sizes;
}

main()
  .then(() => shutdown())
  .catch(async (error) => {
    await shutdown();
    exitWith(error);
  });

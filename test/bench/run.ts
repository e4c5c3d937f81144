import { exitWith, step } from '../../db/lifecycle/console';
import { appSecrets } from '../../db/lifecycle/app-secrets';
import { runCommand } from '../../db/lifecycle/run-command';
import { startServers } from '../../db/lifecycle/servers';
import { shutdown } from '../../db/lifecycle/shutdown';
import { startTestApp } from '../e2e/support/test-app';
import { load } from './load';

/**
 * `npm run bench`: figures as ratios against a baseline measured in the same run, never as
 * absolute times, so they compare across machines. Later capabilities add their own sections.
 */
async function main(): Promise<void> {
  const seconds = Number(process.env.BENCH_SECONDS ?? 5);
  const connections = Number(process.env.BENCH_CONNECTIONS ?? 20);
  const env = await startServers('throwaway');
  await runCommand('npx', ['tsx', 'db/cli.ts', 'migrate'], env, 'Migrations');
  await runCommand('npx', ['tsx', 'db/cli.ts', 'seed'], env, 'Demo seed');
  Object.assign(process.env, env, appSecrets(false), { NODE_ENV: 'production', LOG_LEVEL: 'warn' });

  const testApp = await startTestApp();
  await testApp.app.listen(0, '127.0.0.1');
  const baseUrl = (await testApp.app.getUrl()).replace('[::1]', '127.0.0.1');

  step(`Load: ${connections} connections × ${seconds} s per route…`);
  await load(baseUrl, '/api/health', connections, 1); // warm-up
  const baseline = await load(baseUrl, '/api/health', connections, seconds);
  const routes = [
    await load(baseUrl, '/api/regions', connections, seconds),
    await load(baseUrl, '/api/chapters', connections, seconds),
  ];
  await testApp.close();

  const rows = [baseline, ...routes].map((r) => ({
    route: r.path,
    requests: r.requests,
    'p50 ms': r.p50Ms,
    'p95 ms (≤p97.5)': r.p95Ms,
    errors: r.errors,
    'p95 ÷ health p95': (r.p95Ms / Math.max(baseline.p95Ms, 0.001)).toFixed(2),
  }));
  console.table(rows);
}

main()
  .then(() => shutdown())
  .catch(async (error) => {
    await shutdown();
    exitWith(error);
  });

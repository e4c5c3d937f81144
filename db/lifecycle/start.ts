import { LifecycleError, exitWith, step } from './console';
import { appSecrets } from './app-secrets';
import { requirePortFree } from './ports';
import { runCommand, startLongRunning, stopLongRunning } from './run-command';
import { startServers } from './servers';
import { isShuttingDown, onShutdown, shutdown } from './shutdown';
import { waitForHttp } from './wait-for-http';
import { DEMO_SIGN_INS } from '../seeders/demo-sign-ins';

/**
 * `npm start`: private MariaDB and Redis (or the ones named by DATABASE_URL / REDIS_URL),
 * migrations, demo data when the database is empty, a production build, then the app on :3000.
 */
async function main(): Promise<void> {
  const port = Number(process.env.PORT ?? 3000);
  step('Starting Tallyloom…');
  await requirePortFree(port, 'the app', 'PORT');

  const env = await startServers('persistent');
  step('Applying database migrations…');
  await runCommand('npx', ['tsx', 'db/cli.ts', 'migrate'], env, 'Migrations');
  step('Loading the demo network if the database is empty…');
  await runCommand('npx', ['tsx', 'db/cli.ts', 'seed'], env, 'Demo seed');
  step('Building core, web app and API (npm run build)…');
  await runCommand('npm', ['run', '--silent', 'build'], {}, 'The build');

  await requirePortFree(port, 'the app', 'PORT');
  step(`Starting the app on port ${port}…`);
  const api = startLongRunning('node', ['services/api/dist/main.js'], {
    ...env,
    ...appSecrets(true),
    NODE_ENV: 'production',
    PORT: String(port),
    SERVE_WEB: 'true',
  });
  let exited = false;
  api.once('exit', (code) => {
    exited = true;
    if (isShuttingDown()) return; // we asked it to stop
    step(`The app stopped unexpectedly (exit ${code ?? 'signal'}); stopping the servers.`);
    void shutdown().then(() => process.exit(1));
  });
  onShutdown(() => stopLongRunning(api));

  if (!(await waitForHttp(`http://127.0.0.1:${port}/api/health`, 60_000, () => exited))) {
    throw new LifecycleError(
      'The app did not answer on /api/health within 60 s; see the output above.',
    );
  }
  printWelcome(port);
}

function printWelcome(port: number): void {
  const lines = [
    '',
    `  Tallyloom is running:  http://localhost:${port}`,
    `  API documentation:     http://localhost:${port}/api/docs`,
    '',
    '  Demo sign-ins (invented people, demo data only):',
    ...DEMO_SIGN_INS.map(
      (s) =>
        `    ${s.roleLabel.padEnd(21)} ${s.email.padEnd(41)} ${s.password.padEnd(24)} ${s.chapterName ?? (s.regionCode ? `region ${s.regionCode}` : 'whole network')}`,
    ),
    '',
    '  Press Ctrl-C to stop the app, MariaDB and Redis.',
    '',
  ];
  process.stdout.write(`${lines.join('\n')}\n`);
}

main().catch(async (error) => {
  await shutdown();
  exitWith(error);
});

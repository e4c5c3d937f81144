import { exitWith, step } from './console';
import { appSecrets } from './app-secrets';
import { runCommand, startLongRunning, stopLongRunning } from './run-command';
import { startServers } from './servers';
import { onShutdown, shutdown } from './shutdown';

/**
 * `npm run dev`: the same private servers as `npm start`, then Nest in watch mode on :3000 and
 * Vite's dev server on :5173, which proxies /api to Nest.
 */
async function main(): Promise<void> {
  const env = await startServers('persistent');
  await runCommand('npx', ['tsx', 'db/cli.ts', 'migrate'], env, 'Migrations');
  await runCommand('npx', ['tsx', 'db/cli.ts', 'seed'], env, 'Demo seed');
  await runCommand(
    'npm',
    ['run', '--silent', 'build', '-w', 'packages/core'],
    {},
    'The core build',
  );
  await runCommand('npm', ['run', '--silent', 'build', '-w', 'reports'], {}, 'The reports build');

  const api = startLongRunning('npm', ['run', 'dev', '-w', 'services/api'], {
    ...env,
    ...appSecrets(true),
    NODE_ENV: 'development',
  });
  const web = startLongRunning('npm', ['run', 'dev', '-w', 'packages/web'], {});
  onShutdown(() => stopLongRunning(api));
  onShutdown(() => stopLongRunning(web));
  for (const child of [api, web]) {
    child.once('exit', () => void shutdown().then(() => process.exit(1)));
  }
  step(
    'Dev servers starting: web on http://localhost:5173 (proxying /api to :3000). Ctrl-C stops everything.',
  );
}

main().catch(async (error) => {
  await shutdown();
  exitWith(error);
});

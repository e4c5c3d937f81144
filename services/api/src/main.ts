import 'reflect-metadata';
import { createApp } from './app.factory';
import { AppConfig } from './config/app-config';

async function bootstrap(): Promise<void> {
  const app = await createApp();
  const config = app.get(AppConfig);
  try {
    await app.listen(config.port, config.host);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'EADDRINUSE') {
      process.stderr.write(
        `[tallyloom] Port ${config.port} is already in use: stop what runs there or set PORT to another port.\n`,
      );
      await app.close();
      process.exit(1);
    }
    throw error;
  }
}

bootstrap().catch((error: Error) => {
  process.stderr.write(`[tallyloom] The API could not start: ${error.message}\n`);
  process.exit(1);
});

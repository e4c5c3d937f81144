import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { Logger } from 'nestjs-pino';
import { AppModule } from './app.module';
import { ALL_QUEUES } from './jobs/queue-names';

/**
 * `npm run worker`: the job processors without HTTP, for running them apart from the API
 * (JOB_PROCESSORS=off there). Any number of workers may share one Redis and one MariaDB.
 */
async function bootstrap(): Promise<void> {
  const app = await NestFactory.createApplicationContext(AppModule.forRoot({ worker: true }), {
    bufferLogs: true,
  });
  const logger = app.get(Logger);
  app.useLogger(logger);

  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.log(`${signal}: finishing the active jobs, then stopping`, 'Worker');
    // Closing the app closes each Bull queue, which waits for its active job to finish.
    app.close().then(
      () => process.exit(0),
      (error: Error) => {
        logger.error(`could not stop cleanly: ${error.message}`, 'Worker');
        process.exit(1);
      },
    );
  };
  process.once('SIGTERM', () => stop('SIGTERM'));
  process.once('SIGINT', () => stop('SIGINT'));

  await app.init();
  logger.log(`worker ${process.pid} ready on queues ${ALL_QUEUES.join(', ')}`, 'Worker');
}

bootstrap().catch((error: Error) => {
  process.stderr.write(`[tallyloom] The worker could not start: ${error.message}\n`);
  process.exit(1);
});

import { setTimeout as sleep } from 'node:timers/promises';
import { connectTo } from './db-connection';

/**
 * Waits until InnoDB has written back the pages a bulk load left dirty (at most `maxSeconds`),
 * so no measurement shares the machine with the server's background flushing: a phase measured
 * during it and its baseline measured after it would not compare. Says how long it waited and
 * how many pages were still dirty.
 */
export async function settledAfterLoad(
  databaseUrl: string,
  maxSeconds = 120,
): Promise<{ seconds: number; dirtyPages: number }> {
  const connection = await connectTo(databaseUrl);
  const started = Date.now();
  try {
    let dirty = 0;
    for (;;) {
      const rows = await connection.query<Array<{ Variable_name: string; Value: string }>>(
        `SHOW GLOBAL STATUS WHERE Variable_name IN
           ('Innodb_buffer_pool_pages_dirty', 'Innodb_buffer_pool_pages_total')`,
      );
      const value = (name: string) =>
        Number(rows.find((row) => row.Variable_name === name)?.Value ?? 0);
      dirty = value('Innodb_buffer_pool_pages_dirty');
      // A few percent stay dirty on an idle server (its own bookkeeping): close enough.
      if (dirty <= value('Innodb_buffer_pool_pages_total') / 20) break;
      if (Date.now() - started > maxSeconds * 1000) break;
      await sleep(1000);
    }
    return { seconds: (Date.now() - started) / 1000, dirtyPages: dirty };
  } finally {
    await connection.end();
  }
}

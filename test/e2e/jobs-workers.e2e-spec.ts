import { getModelToken } from '@nestjs/sequelize';
import type { Job } from 'bull';
import { simpleParser } from 'mailparser';
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { dirname, join } from 'node:path';
import { SMTPServer } from 'smtp-server';
import { QueueName } from '../../services/api/src/jobs/queue-names';
import { TallyReminder } from '../../services/api/src/reminders/models/tally-reminder.model';
import { ReminderJob, type ReminderJobResult } from '../../services/api/src/reminders/reminder-job';
import { ownRedisUrl, queueOf } from './support/job-queues';
import { aRegion } from './support/network-builders';
import { aUser } from './support/people-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(300_000);

const REPO = join(__dirname, '..', '..');
// Inside the repo, so the compiled worker finds node_modules; per run, beside its uploads. Laid
// out as services/api is (dist/ beside package.json), which the health module reads its version from.
const API_DIR = join(
  process.env.UPLOADS_DIR ? dirname(process.env.UPLOADS_DIR) : join(REPO, '.data'),
  'api',
);
const OUT_DIR = join(API_DIR, 'dist');

/** A mail server in this process that the workers send to; it can hold a message unanswered. */
class FakeSmtp {
  accepted: Array<{ to: string; subject: string }> = [];
  hold = false;
  held: Array<{ mail: { to: string; subject: string }; answer: () => void }> = [];
  private server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData: (stream, _session, callback) => {
      simpleParser(stream)
        .then((mail) => {
          const to = Array.isArray(mail.to) ? mail.to.map((a) => a.text).join(', ') : mail.to?.text;
          const message = { to: to ?? '', subject: mail.subject ?? '' };
          const answer = () => {
            this.accepted.push(message);
            callback();
          };
          // Held: not answered until released, so the sending worker waits inside its job.
          if (this.hold) this.held.push({ mail: message, answer });
          else answer();
        })
        .catch((error: Error) => callback(error));
    },
  });
  port = 0;

  /** Answers the held messages ("accepted") and lets the next ones through. */
  release(): void {
    this.hold = false;
    for (const { answer } of this.held.splice(0)) answer();
  }

  /** Forgets the held messages unanswered: their sender is gone. */
  drop(): void {
    this.hold = false;
    this.held.splice(0);
  }

  async start(): Promise<void> {
    this.port = await new Promise<number>((resolve) => {
      this.server.listen(0, '127.0.0.1', () =>
        resolve((this.server.server.address() as AddressInfo).port),
      );
    });
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}

/** A process killed by a signal keeps exitCode null: its signalCode says it is gone. */
const alive = (child: ChildProcess) => child.exitCode === null && child.signalCode === null;

async function until(what: string, check: () => boolean | Promise<boolean>): Promise<void> {
  for (let i = 0; i < 1200; i += 1) {
    if (await check()) return;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`gave up waiting for ${what}`);
}

/**
 * One API that only enqueues (JOB_PROCESSORS=off, in this process) and two `npm run worker`
 * processes, on the run's MariaDB and a Redis database of their own: every job runs once, no
 * reminder goes out twice, and a worker killed mid-job loses nothing.
 */
describe('jobs across processes', () => {
  let testApp: TestApp;
  let smtp: FakeSmtp;
  const workers: ChildProcess[] = [];
  const outputs = new Map<ChildProcess, string>();
  const redisUrl = ownRedisUrl(9);

  function startWorker(): Promise<ChildProcess> {
    const child = spawn('node', [join(OUT_DIR, 'worker.js')], {
      cwd: REPO,
      env: {
        ...process.env,
        REDIS_URL: redisUrl,
        SMTP_URL: `smtp://127.0.0.1:${smtp.port}`,
        NODE_ENV: 'test',
        LOG_LEVEL: 'info',
        // Short, so a killed worker's job is taken over within seconds.
        JOB_LOCK_MS: '3000',
        JOB_STALLED_CHECK_MS: '1000',
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    workers.push(child);
    outputs.set(child, '');
    const collect = (chunk: Buffer) => outputs.set(child, outputs.get(child)! + chunk.toString());
    return new Promise((resolve, reject) => {
      child.stdout.on('data', (chunk: Buffer) => {
        collect(chunk);
        if (outputs.get(child)!.includes('ready on queues')) resolve(child);
      });
      child.stderr.on('data', collect);
      child.once('exit', (code) =>
        reject(new Error(`worker exited (${code}): ${outputs.get(child)}`)),
      );
    });
  }

  beforeAll(async () => {
    mkdirSync(OUT_DIR, { recursive: true });
    copyFileSync(join(REPO, 'services', 'api', 'package.json'), join(API_DIR, 'package.json'));
    // The workers run compiled code, as `npm run worker` does (tsx lacks decorator metadata).
    // Type errors are the lint's to report; tsc still emits, and the worker must then start.
    const build = spawnSync(
      'npx',
      [
        'tsc',
        '-p',
        'services/api/tsconfig.build.json',
        '--outDir',
        OUT_DIR,
        '--declaration',
        'false',
      ],
      { cwd: REPO, encoding: 'utf8' },
    );
    if (!existsSync(join(OUT_DIR, 'worker.js'))) {
      throw new Error(`the API build failed: ${build.stdout}${build.stderr}`);
    }
    smtp = new FakeSmtp();
    await smtp.start();
    testApp = await startTestApp({ REDIS_URL: redisUrl, JOB_PROCESSORS: 'off' });
    await Promise.all([startWorker(), startWorker()]);
  });
  afterAll(async () => {
    for (const worker of workers) if (alive(worker)) worker.kill('SIGKILL');
    await testApp?.close();
    await smtp?.close();
  });

  const queue = () => queueOf(testApp.app, QueueName.Reminders);
  const rowsFor = async (chapterIds: number[]) =>
    (
      await testApp.app
        .get<typeof TallyReminder>(getModelToken(TallyReminder))
        .findAll({ where: { chapterId: chapterIds } })
    ).map((row) => `${row.chapterId} ${row.month} ${row.kind}`);
  const logsOf = async (job: Job) => (await queue().getJobLogs(String(job.id))).logs;

  it('runs every job once, in one of the two workers, and sends each reminder once', async () => {
    const { chapters } = await aRegion()
      .named('Worker Region')
      .withChapter('Worker Mill', '2024-01-01', 10)
      .withChapter('Worker Ford', '2024-01-01', 10)
      .withChapter('Worker Brook', '2024-01-01', 10)
      .build(testApp.app);
    const chapterIds = chapters.map((chapter) => chapter.id);
    const leads: string[] = [];
    for (const id of chapterIds) {
      leads.push((await aUser().withRole('chapter_lead').inChapter(id).build(testApp.app)).email);
    }
    // 20 months × (3 days before, 2 days after the due day on the 10th) = 40 days, each queued
    // twice: 80 jobs, and 20 × 2 × 3 chapters = 120 reminders to send, each once.
    const days: string[] = [];
    for (let n = 0; n < 20; n += 1) {
      const following = new Date(Date.UTC(2033, n + 1, 1)).toISOString().slice(0, 7);
      days.push(`${following}-07`, `${following}-12`);
    }
    const jobs: Job[] = [];
    for (const today of [...days, ...days]) {
      jobs.push(await queue().add(ReminderJob.Daily, { today, chapterIds }, { attempts: 3 }));
    }
    const results = (await Promise.all(jobs.map((job) => job.finished()))) as ReminderJobResult[];

    const workerPids = workers.map((worker) => worker.pid);
    expect(new Set(results.map((result) => result.pid))).toEqual(new Set(workerPids));
    // Each job was started exactly once: one "started by" line in its log.
    for (const job of jobs) expect(await logsOf(job)).toHaveLength(1);
    expect(results.reduce((sum, result) => sum + result.sent.length, 0)).toBe(120);
    expect(results.reduce((sum, result) => sum + result.alreadySent, 0)).toBe(120);

    const rows = await rowsFor(chapterIds);
    expect(rows).toHaveLength(120);
    expect(new Set(rows).size).toBe(120);
    const mails = smtp.accepted.filter((mail) => leads.includes(mail.to));
    expect(mails).toHaveLength(120);
    expect(new Set(mails.map((mail) => `${mail.to} ${mail.subject}`)).size).toBe(120);
  });

  it('hands the job of a worker killed mid-job to the other, and sends once', async () => {
    const { chapters } = await aRegion()
      .named('Killed Region')
      .withChapter('Killed Mill', '2024-01-01', 10)
      .build(testApp.app);
    const chapterId = chapters[0].id;
    const lead = (await aUser().withRole('chapter_lead').inChapter(chapterId).build(testApp.app))
      .email;

    smtp.hold = true;
    const job = await queue().add(
      ReminderJob.Daily,
      { today: '2035-02-07', chapterIds: [chapterId] },
      { attempts: 3 },
    );
    // The worker is now inside the send, its reminder row claimed but not committed.
    await until('the held mail', () => smtp.held.length === 1);
    const [started] = await logsOf(job);
    const holder = workers.find((worker) => started === `started by process ${worker.pid}`)!;
    const other = workers.find((worker) => worker !== holder && alive(worker))!;
    expect(holder).toBeDefined();
    holder.kill('SIGKILL');
    smtp.drop();

    const result = (await job.finished()) as ReminderJobResult;
    expect(result.pid).toBe(other.pid);
    expect(result.sent).toEqual([{ chapterId, month: '2035-01', kind: 'before_due' }]);
    expect(await logsOf(job)).toEqual([
      `started by process ${holder.pid}`,
      `started by process ${other.pid}`,
    ]);
    expect(await rowsFor([chapterId])).toEqual([`${chapterId} 2035-01-01 before_due`]);
    expect(smtp.accepted.filter((mail) => mail.to === lead)).toHaveLength(1);
  });

  it('finishes its running job before it stops on SIGTERM', async () => {
    const running = workers.find((worker) => alive(worker))!;
    const { chapters } = await aRegion()
      .named('Stopping Region')
      .withChapter('Stopping Mill', '2024-01-01', 10)
      .build(testApp.app);
    const chapterId = chapters[0].id;
    await aUser().withRole('chapter_lead').inChapter(chapterId).build(testApp.app);

    smtp.hold = true;
    const job = await queue().add(
      ReminderJob.Daily,
      { today: '2035-03-07', chapterIds: [chapterId] },
      { attempts: 3 },
    );
    await until('the held mail', () => smtp.held.length === 1);
    const exited = new Promise<number | null>((resolve) => running.once('exit', resolve));
    running.kill('SIGTERM');
    // The worker has the signal and is still there, waiting for its job to end.
    await until('the worker to take the signal', () =>
      outputs.get(running)!.includes('SIGTERM: finishing the active jobs'),
    );
    expect(running.exitCode).toBeNull();
    smtp.release();

    const result = (await job.finished()) as ReminderJobResult;
    expect(result.pid).toBe(running.pid);
    expect(result.sent).toEqual([{ chapterId, month: '2035-02', kind: 'before_due' }]);
    expect(await exited).toBe(0);
    expect(await rowsFor([chapterId])).toEqual([`${chapterId} 2035-02-01 before_due`]);
  });
});

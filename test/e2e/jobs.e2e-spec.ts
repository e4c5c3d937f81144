import type { ApiErrorBody, JobQueueView } from '@tallyloom/core';
import { ALL_QUEUES, QueueName } from '../../services/api/src/jobs/queue-names';
import { ReminderJob } from '../../services/api/src/reminders/reminder-job';
import { ownRedisUrl, queueOf } from './support/job-queues';
import { signedIn } from './support/people-builders';
import { aRequestId, auditedBy } from './support/setup-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(60_000);

/** The Jobs page's API, on a Redis database of its own so only this app's jobs show. */
describe('jobs API', () => {
  let testApp: TestApp;
  let admin: string;
  let adminId: number;

  beforeAll(async () => {
    testApp = await startTestApp({ REDIS_URL: ownRedisUrl(8) });
    const built = await signedIn(testApp, 'network_admin');
    admin = `Bearer ${built.token}`;
    adminId = built.user.id;
  });
  afterAll(() => testApp.close());

  const list = async (auth = admin) =>
    (await testApp.http().get('/api/jobs').set('Authorization', auth).expect(200))
      .body as JobQueueView[];
  const retry = (queue: string, id: string, requestId = aRequestId('job-retry')) =>
    testApp
      .http()
      .post(`/api/jobs/${queue}/${id}/retry`)
      .set('Authorization', admin)
      .set('X-Request-Id', requestId);
  const reminders = () => queueOf(testApp.app, QueueName.Reminders);

  /** A reminder job that fails at once: its day is not a date. */
  async function aFailedJob() {
    const job = await reminders().add(ReminderJob.Daily, { today: 'someday' }, { attempts: 1 });
    await expect(job.finished()).rejects.toThrow('today must be an ISO date; got someday');
    return job;
  }

  it('lists every queue, with the daily reminders as a repeatable job', async () => {
    // The schedule is registered in the background as the app starts (never blocking start-up).
    let queues = await list();
    for (
      let tries = 0;
      tries < 50 && !queues.some((queue) => queue.repeatable.length > 0);
      tries++
    ) {
      await new Promise((resolve) => setTimeout(resolve, 100));
      queues = await list();
    }
    expect(queues.map((queue) => queue.name)).toEqual(ALL_QUEUES);
    const reminderQueue = queues.find((queue) => queue.name === String(QueueName.Reminders))!;
    expect(reminderQueue.repeatable).toEqual([
      {
        name: ReminderJob.Daily,
        cron: '0 7 * * *',
        next: expect.stringMatching(/T07:00:00\.000Z$/) as string,
      },
    ]);
  });

  it('shows a failure with its reason and attempts', async () => {
    const job = await aFailedJob();
    const reminderQueue = (await list()).find(
      (queue) => queue.name === String(QueueName.Reminders),
    )!;
    expect(reminderQueue.counts.failed).toBeGreaterThanOrEqual(1);
    expect(reminderQueue.failed).toContainEqual({
      id: String(job.id),
      name: ReminderJob.Daily,
      failedReason: 'today must be an ISO date; got someday',
      attemptsMade: 1,
      failedAt: expect.stringMatching(/^\d{4}-\d{2}-\d{2}T/) as string,
    });
  });

  it('retries a failed job and audits who did it', async () => {
    const job = await aFailedJob();
    const requestId = aRequestId('job-retry');
    const response = await retry(QueueName.Reminders, String(job.id), requestId);
    expect(response.status).toBe(200);
    expect((response.body as JobQueueView).name).toBe(QueueName.Reminders);
    expect(await auditedBy(testApp.app, requestId)).toEqual([
      expect.objectContaining({
        action: 'job.retried',
        entityType: 'job',
        entityId: `reminders/${job.id}`,
        actorUserId: adminId,
        before: {
          state: 'failed',
          failedReason: 'today must be an ISO date; got someday',
          attemptsMade: 1,
        },
        after: { state: 'waiting' },
      }),
    ]);
    // It ran again (and failed again, the day being no better).
    const again = await reminders().getJob(job.id);
    for (let i = 0; i < 100 && (await again!.getState()) !== 'failed'; i += 1) {
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    expect((await reminders().getJob(job.id))!.attemptsMade).toBe(2);
  });

  it('refuses to retry a job that has not failed (409), changing nothing', async () => {
    const job = await reminders().add(ReminderJob.Daily, { today: '2031-01-01', chapterIds: [] });
    await job.finished();
    const requestId = aRequestId('job-retry-done');
    const response = await retry(QueueName.Reminders, String(job.id), requestId);
    expect(response.status).toBe(409);
    expect((response.body as ApiErrorBody).message).toBe(
      `Job ${job.id} in the queue "reminders" is completed; only a failed job can be retried.`,
    );
    expect(await auditedBy(testApp.app, requestId)).toEqual([]);
  });

  it('answers 404 for an unknown queue or job', async () => {
    const queue = await retry('knitting', '1');
    expect(queue.status).toBe(404);
    expect((queue.body as ApiErrorBody).message).toBe(
      `No queue named "knitting"; the queues are ${ALL_QUEUES.join(', ')}.`,
    );
    const job = await retry(QueueName.Reminders, 'no-such-job');
    expect(job.status).toBe(404);
    expect((job.body as ApiErrorBody).message).toBe('No job no-such-job in the queue "reminders".');
  });

  it('is for admins and national staff only', async () => {
    const staff = await signedIn(testApp, 'national_staff');
    expect((await list(`Bearer ${staff.token}`)).length).toBe(ALL_QUEUES.length);
    for (const role of [
      'regional_coordinator',
      'chapter_lead',
      'grant_writer',
      'auditor',
    ] as const) {
      const { token } = await signedIn(testApp, role);
      await testApp.http().get('/api/jobs').set('Authorization', `Bearer ${token}`).expect(403);
    }
  });
});

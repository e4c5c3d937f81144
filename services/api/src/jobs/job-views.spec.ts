import type { Job } from 'bull';
import { progressOf, toJobQueueView } from './job-views';

describe('job views', () => {
  it('shows progress as a number from 0 to 100, whatever a processor set', () => {
    expect(progressOf(42)).toBe(42);
    expect(progressOf(140)).toBe(100);
    expect(progressOf(-3)).toBe(0);
    expect(progressOf({ step: 2 })).toBe(0);
  });

  it('maps times to ISO strings and leaves missing ones null', () => {
    const failed = {
      id: 7,
      name: 'daily',
      failedReason: 'mail server down',
      attemptsMade: 5,
      finishedOn: Date.UTC(2026, 2, 10, 7, 0, 1),
    } as unknown as Job;
    const active = { id: 'x1', name: 'rebuild', progress: () => 30 } as unknown as Job;
    const view = toJobQueueView(
      'reminders',
      { waiting: 1, active: 1, completed: 9, failed: 1, delayed: 0 },
      [active],
      [failed],
      [
        {
          key: 'k',
          name: 'daily',
          id: 'd',
          endDate: 0,
          tz: 'UTC',
          cron: '0 7 * * *',
          every: 0,
          next: Date.UTC(2026, 2, 11, 7),
        },
      ],
    );
    expect(view).toEqual({
      name: 'reminders',
      counts: { waiting: 1, active: 1, completed: 9, failed: 1, delayed: 0 },
      active: [{ id: 'x1', name: 'rebuild', progress: 30, startedAt: null }],
      failed: [
        {
          id: '7',
          name: 'daily',
          failedReason: 'mail server down',
          attemptsMade: 5,
          failedAt: '2026-03-10T07:00:01.000Z',
        },
      ],
      repeatable: [{ name: 'daily', cron: '0 7 * * *', next: '2026-03-11T07:00:00.000Z' }],
    });
  });
});

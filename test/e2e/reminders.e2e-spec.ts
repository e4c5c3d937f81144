import { getModelToken } from '@nestjs/sequelize';
import { ReminderJob } from '../../services/api/src/reminders/reminder-job';
import type { ReminderJobResult } from '../../services/api/src/reminders/reminder-job';
import { QueueName } from '../../services/api/src/jobs/queue-names';
import { DevMailCatcher } from '../../services/api/src/mail/dev-mail-catcher';
import { MailSender } from '../../services/api/src/mail/mail-sender';
import { TallyReminder } from '../../services/api/src/reminders/models/tally-reminder.model';
import { RemindersService } from '../../services/api/src/reminders/reminders.service';
import { MonthlyTally } from '../../services/api/src/tallies/models/monthly-tally.model';
import { ownRedisUrl, queueOf } from './support/job-queues';
import { aRegion } from './support/network-builders';
import { aUser } from './support/people-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(60_000);

/**
 * Reminders for months far ahead of the demo data (2031), for chapters this suite makes, with the
 * seeded settings: 3 days before the due day and 2 days after.
 */
describe('tally reminders', () => {
  let testApp: TestApp;
  let service: RemindersService;
  let catcher: DevMailCatcher;
  let reminders: typeof TallyReminder;
  let ids: { early: number; submitted: number; late: number; leadless: number };
  let names: { early: string; late: string };
  let leads: { early: string; earlySecond: string; late: string };
  let all: number[];

  beforeAll(async () => {
    testApp = await startTestApp({
      REDIS_URL: ownRedisUrl(7),
      APP_URL: 'https://console.test.example',
    });
    service = testApp.app.get(RemindersService);
    catcher = testApp.app.get(DevMailCatcher);
    reminders = testApp.app.get<typeof TallyReminder>(getModelToken(TallyReminder));
    const { chapters } = await aRegion()
      .named('Reminder Region')
      .withChapter('Early Mill', '2024-01-01', 10)
      .withChapter('Filed Ford', '2024-01-01', 10)
      .withChapter('Late Brook', '2024-01-01', 20)
      .withChapter('Leadless Lea', '2024-01-01', 10)
      .build(testApp.app);
    const [early, submitted, late, leadless] = chapters;
    ids = { early: early.id, submitted: submitted.id, late: late.id, leadless: leadless.id };
    names = { early: early.name, late: late.name };
    all = chapters.map((chapter) => chapter.id);
    const lead = async (chapterId: number) =>
      (await aUser().withRole('chapter_lead').inChapter(chapterId).build(testApp.app)).email;
    leads = {
      early: await lead(early.id),
      earlySecond: await lead(early.id),
      late: await lead(late.id),
    };
    await lead(submitted.id);
    // Deactivated people are not reminded, and a chapter with only them has nobody to remind.
    await aUser().withRole('chapter_lead').inChapter(leadless.id).deactivated().build(testApp.app);

    const tallies = testApp.app.get<typeof MonthlyTally>(getModelToken(MonthlyTally));
    // A draft is still missing; a submitted tally is not, whatever happened to it since.
    await tallies.create({ chapterId: early.id, month: '2031-03-01', state: 'draft' });
    await tallies.create({
      chapterId: submitted.id,
      month: '2031-03-01',
      state: 'returned',
      firstSubmittedAt: new Date('2031-04-02T09:00:00Z'),
    });
  });
  afterAll(() => testApp.close());

  const mailsTo = (email: string) => catcher.list().filter((mail) => mail.to.includes(email));
  const rowsOf = async () =>
    (
      await reminders.findAll({
        where: { chapterId: all },
        order: [
          ['chapterId', 'ASC'],
          ['month', 'ASC'],
          ['kind', 'ASC'],
        ],
      })
    ).map((row) => `${row.chapterId} ${row.month} ${row.kind}`);
  /** The catcher receives over SMTP; the send resolves once it has accepted the message. */
  const waitForMails = async (email: string, count: number) => {
    for (let i = 0; i < 100 && mailsTo(email).length < count; i += 1) {
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    return mailsTo(email);
  };

  it('reminds the leads of a missing tally 3 days before its due day, once', async () => {
    const first = await service.run('2031-04-07', all);
    expect(first.sent).toEqual([{ chapterId: ids.early, month: '2031-03', kind: 'before_due' }]);
    expect(first.alreadySent).toBe(0);

    const mails = await waitForMails(leads.early, 1);
    expect(mails).toHaveLength(1);
    expect(mails[0].to.sort()).toEqual([leads.early, leads.earlySecond].sort());
    expect(mails[0].subject).toBe(`${names.early}: the Mar 2031 tally is due on 10 Apr 2031`);
    expect(mails[0].text).toContain(
      `The monthly tally of ${names.early} for Mar 2031 is due on 10 Apr 2031`,
    );
    expect(mails[0].links).toEqual(['https://console.test.example/tallies']);

    const again = await service.run('2031-04-07', all);
    expect(again.sent).toEqual([]);
    expect(again.alreadySent).toBe(1);
    expect(mailsTo(leads.early)).toHaveLength(1);
  });

  it('reminds 2 days after the due day, and chapters with another due day on theirs', async () => {
    const after = await service.run('2031-04-12', all);
    expect(after.sent).toEqual([{ chapterId: ids.early, month: '2031-03', kind: 'after_due' }]);
    const mails = await waitForMails(leads.early, 2);
    expect(mails[0].subject).toBe(`${names.early}: the Mar 2031 tally was due on 10 Apr 2031`);

    const lateChapter = await service.run('2031-04-17', all);
    expect(lateChapter.sent).toEqual([
      { chapterId: ids.late, month: '2031-03', kind: 'before_due' },
    ]);
    const lateMails = await waitForMails(leads.late, 1);
    expect(lateMails.map((mail) => mail.subject)).toEqual([
      `${names.late}: the Mar 2031 tally is due on 20 Apr 2031`,
    ]);

    expect(await rowsOf()).toEqual([
      // The kind sorts in its ENUM's order: before, then after.
      `${ids.early} 2031-03-01 before_due`,
      `${ids.early} 2031-03-01 after_due`,
      `${ids.late} 2031-03-01 before_due`,
    ]);
  });

  it('sends nothing on a day with no due date in reach', async () => {
    expect(await service.run('2031-04-09', all)).toEqual({
      today: '2031-04-09',
      sent: [],
      alreadySent: 0,
    });
  });

  it('leaves no row when sending fails, so the retry sends', async () => {
    const mail = testApp.app.get(MailSender);
    const send = jest.spyOn(mail, 'send').mockRejectedValueOnce(new Error('mail server down'));
    try {
      await expect(service.run('2031-05-07', all)).rejects.toThrow(
        `1 reminder(s) not sent: ${names.early} 2031-04 before_due: mail server down`,
      );
      expect(await rowsOf()).not.toContain(`${ids.early} 2031-04-01 before_due`);

      const retry = await service.run('2031-05-07', all);
      expect(retry.sent).toEqual([{ chapterId: ids.early, month: '2031-04', kind: 'before_due' }]);
      expect(await rowsOf()).toContain(`${ids.early} 2031-04-01 before_due`);
    } finally {
      send.mockRestore();
    }
  });

  it('runs as a queued job for a chosen day, in this process', async () => {
    const job = await queueOf(testApp.app, QueueName.Reminders).add(
      ReminderJob.Daily,
      { today: '2031-05-12', chapterIds: all },
      { attempts: 1 },
    );
    const result = (await job.finished()) as ReminderJobResult;
    expect(result).toEqual({
      today: '2031-05-12',
      sent: [
        { chapterId: ids.early, month: '2031-04', kind: 'after_due' },
        { chapterId: ids.submitted, month: '2031-04', kind: 'after_due' },
      ],
      alreadySent: 0,
      pid: process.pid,
    });
  });

  it('keeps the daily run on the queue at 07:00 UTC', async () => {
    const repeatable = await queueOf(testApp.app, QueueName.Reminders).getRepeatableJobs();
    expect(repeatable).toEqual([
      expect.objectContaining({ name: ReminderJob.Daily, cron: '0 7 * * *', tz: 'UTC' }),
    ]);
  });
});

import { Injectable, Logger } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { isIsoDate, monthEnd, monthStart, type MonthKey } from '@tallyloom/core';
import { Op, QueryTypes, type WhereOptions } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { Chapter } from '../chapters/models/chapter.model';
import { AppConfig } from '../config/app-config';
import { MailSender } from '../mail/mail-sender';
import { SettingsService } from '../settings/settings.service';
import { MonthlyTally } from '../tallies/models/monthly-tally.model';
import { User } from '../users/models/user.model';
import { monthDueIn, monthDueOn, reminderDueDates, type ReminderKind } from './reminder-dates';
import type { ReminderJobResult, ReminderSent } from './reminder-job';
import { reminderMail } from './reminder-mail';

interface Reminder {
  chapter: Chapter;
  month: MonthKey;
  kind: ReminderKind;
  dueOn: string;
  leads: string[];
}

/** Finds the chapter-months whose tally is missing near the due day and e-mails their leads. */
@Injectable()
export class RemindersService {
  private readonly logger = new Logger('Reminders');

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Chapter) private readonly chapters: typeof Chapter,
    @InjectModel(MonthlyTally) private readonly tallies: typeof MonthlyTally,
    @InjectModel(User) private readonly users: typeof User,
    private readonly settings: SettingsService,
    private readonly mail: MailSender,
    private readonly config: AppConfig,
  ) {}

  /**
   * Sends what is due on `today`. Safe to run again and from several processes at once: each
   * chapter-month-kind is sent once. Throws after trying every chapter if any sending failed,
   * so the job is retried; the retry sends only what is still missing.
   */
  async run(today: string, chapterIds?: number[]): Promise<Omit<ReminderJobResult, 'pid'>> {
    if (!isIsoDate(today)) throw new Error(`today must be an ISO date; got ${String(today)}`);
    const sent: ReminderSent[] = [];
    let alreadySent = 0;
    const failures: string[] = [];
    for (const reminder of await this.due(today, chapterIds)) {
      const what = `${reminder.chapter.name} ${reminder.month} ${reminder.kind}`;
      try {
        if (await this.claimAndSend(reminder)) {
          sent.push({ chapterId: reminder.chapter.id, month: reminder.month, kind: reminder.kind });
        } else alreadySent += 1;
      } catch (error) {
        this.logger.warn(`reminder ${what} not sent: ${(error as Error).message}`);
        failures.push(`${what}: ${(error as Error).message}`);
      }
    }
    if (failures.length > 0) {
      throw new Error(`${failures.length} reminder(s) not sent: ${failures.join('; ')}`);
    }
    return { today, sent, alreadySent };
  }

  private async due(today: string, chapterIds?: number[]): Promise<Reminder[]> {
    const reminders: Reminder[] = [];
    for (const { kind, dueOn } of reminderDueDates(today, await this.settings.current())) {
      const month = monthDueIn(dueOn);
      const active: WhereOptions = {
        activeFrom: { [Op.lte]: monthEnd(month) },
        [Op.or]: [{ activeTo: null }, { activeTo: { [Op.gte]: monthStart(month) } }],
        ...(chapterIds ? { id: chapterIds } : {}),
      };
      const chapters = (
        await this.chapters.findAll({ where: active, order: [['id', 'ASC']] })
      ).filter((chapter) => monthDueOn(dueOn, chapter.reportingDueDay) === month);
      if (chapters.length === 0) continue;

      const submitted = new Set(
        (
          await this.tallies.findAll({
            attributes: ['chapterId'],
            where: {
              chapterId: chapters.map((chapter) => chapter.id),
              month: monthStart(month),
              firstSubmittedAt: { [Op.ne]: null },
            },
          })
        ).map((tally) => tally.chapterId),
      );
      const missing = chapters.filter((chapter) => !submitted.has(chapter.id));
      const leads = await this.users.findAll({
        attributes: ['chapterId', 'email'],
        where: { role: 'chapter_lead', active: true, chapterId: missing.map((c) => c.id) },
        order: [['id', 'ASC']],
      });
      for (const chapter of missing) {
        const to = leads.filter((lead) => lead.chapterId === chapter.id).map((lead) => lead.email);
        // A chapter without a lead has nobody to remind; the missing report shows on dashboards.
        if (to.length > 0) reminders.push({ chapter, month, kind, dueOn, leads: to });
      }
    }
    return reminders;
  }

  /**
   * The row goes in before the e-mail goes out, inside one transaction: a second run waits on
   * the row's lock and then skips it; a failed send, or a process killed mid-send, rolls the row
   * back, so the retry sends. Only a crash between the mail server's "accepted" and the commit
   * could send twice.
   */
  private claimAndSend(reminder: Reminder): Promise<boolean> {
    return this.sequelize.transaction(async (transaction) => {
      const [, inserted] = await this.sequelize.query(
        'INSERT IGNORE INTO tally_reminders (chapter_id, month, kind, sent_to) VALUES (?, ?, ?, ?)',
        {
          replacements: [
            reminder.chapter.id,
            monthStart(reminder.month),
            reminder.kind,
            reminder.leads.join(', ').slice(0, 1000),
          ],
          type: QueryTypes.INSERT,
          transaction,
        },
      );
      if (Number(inserted) === 0) return false;
      await this.mail.send(
        reminderMail({
          kind: reminder.kind,
          chapterName: reminder.chapter.name,
          month: reminder.month,
          dueOn: reminder.dueOn,
          to: reminder.leads,
          appUrl: this.config.appUrl,
        }),
      );
      return true;
    });
  }
}

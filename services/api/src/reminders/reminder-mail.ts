import { monthLabel, type MonthKey } from '@tallyloom/core';
import type { OutgoingMail } from '../mail/mail-sender';
import type { ReminderKind } from './reminder-dates';

export interface ReminderMailInput {
  kind: ReminderKind;
  chapterName: string;
  month: MonthKey;
  dueOn: string;
  to: string[];
  appUrl: string;
}

/** '2026-04-10' → '10 Apr 2026': day first, month in words, so no reader misreads it. */
function dateLabel(isoDate: string): string {
  return `${Number(isoDate.slice(8, 10))} ${monthLabel(isoDate.slice(0, 7))}`;
}

/** One e-mail to every lead of the chapter, naming the chapter, the month and the due date. */
export function reminderMail(input: ReminderMailInput): OutgoingMail {
  const month = monthLabel(input.month);
  const due = dateLabel(input.dueOn);
  const before = input.kind === 'before_due';
  const subject = before
    ? `${input.chapterName}: the ${month} tally is due on ${due}`
    : `${input.chapterName}: the ${month} tally was due on ${due}`;
  const opening = before
    ? `The monthly tally of ${input.chapterName} for ${month} is due on ${due} and has not been submitted yet.`
    : `The monthly tally of ${input.chapterName} for ${month} was due on ${due} and is still missing.`;
  return {
    to: input.to.join(', '),
    subject,
    text: [
      'Hello,',
      '',
      opening,
      'You can fill it in and submit it here:',
      `${input.appUrl}/tallies`,
      '',
      'You get this e-mail as a chapter lead. If the tally is already on its way, thank you.',
      '',
      'Tallyloom',
    ].join('\n'),
  };
}

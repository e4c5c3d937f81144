import { reminderMail } from './reminder-mail';

describe('reminderMail', () => {
  const input = {
    chapterName: 'Alder Falls',
    month: '2026-03',
    dueOn: '2026-04-10',
    to: ['lead.one@test.example', 'lead.two@test.example'],
    appUrl: 'https://console.test.example',
  };

  it('names the chapter, month and due date before the due day, and links to the tallies', () => {
    const mail = reminderMail({ ...input, kind: 'before_due' });
    expect(mail.to).toBe('lead.one@test.example, lead.two@test.example');
    expect(mail.subject).toBe('Alder Falls: the Mar 2026 tally is due on 10 Apr 2026');
    expect(mail.text).toContain(
      'The monthly tally of Alder Falls for Mar 2026 is due on 10 Apr 2026 and has not been submitted yet.',
    );
    expect(mail.text).toContain('https://console.test.example/tallies\n');
  });

  it('says the tally is missing after the due day', () => {
    const mail = reminderMail({ ...input, kind: 'after_due' });
    expect(mail.subject).toBe('Alder Falls: the Mar 2026 tally was due on 10 Apr 2026');
    expect(mail.text).toContain('was due on 10 Apr 2026 and is still missing.');
  });
});

import { format, subMonths } from 'date-fns';
import type { Locator, Page } from 'playwright-core';
import { QueryTypes, Sequelize } from 'sequelize';
import { DEMO_SIGN_INS } from '../../db/seeders/demo-sign-ins';
import { screenshot, type WatchedPage } from './support/browser';
import { servedAppSuite } from './support/served-app';
import { signInThroughForm } from './support/sign-in';

const lead = DEMO_SIGN_INS.find((person) => person.role === 'chapter_lead')!;
const coordinator = DEMO_SIGN_INS.find((person) => person.role === 'regional_coordinator')!;

// The demo leaves last month's Alder Falls tally unfiled, for exactly this journey.
const lastMonth = format(subMonths(new Date(), 1), 'MMM yyyy');

jest.setTimeout(180_000);

async function numberIn(box: Locator): Promise<number> {
  return Number((await box.inputValue()).replace(/,/g, ''));
}

/** Waits until the autosave has caught up with what was typed. */
async function settled(page: Page): Promise<void> {
  await page.getByText(/^Saved /).waitFor();
}

/** Submits the open tally, acknowledging whatever warnings the checks raise. */
async function submitTally(page: Page, note: string): Promise<void> {
  const submit = page.getByRole('button', { name: 'Submit for review' });
  await submit.click();
  const dialog = page.getByRole('dialog', { name: 'Submit with warnings' });
  // Once submitted the form turns read-only and the button goes away.
  const gone = submit.waitFor({ state: 'detached' });
  await Promise.race([dialog.waitFor(), gone]);
  if (await dialog.isVisible()) {
    const boxes = dialog.getByRole('checkbox');
    for (let i = 0; i < (await boxes.count()); i++) await boxes.nth(i).check();
    await dialog.getByLabel('Note for the reviewer').fill(note);
    await screenshot(page, 'tallies-2-acknowledge-warnings');
    await dialog.getByRole('button', { name: 'Submit tally' }).click();
  }
  await gone;
}

async function as(opened: Promise<WatchedPage>, path: string, email: string, password: string) {
  const watched = await opened;
  await watched.page.goto(path);
  await signInThroughForm(watched.page, email, password);
  return watched;
}

describe('monthly tallies: file, return, fix, approve and amend', () => {
  const suite = servedAppSuite();

  it('takes one month through the whole review flow', async () => {
    // 1. The chapter lead starts last month's tally and files it with a warning.
    const leadView = await as(suite.open(), '/tallies', lead.email, lead.password);
    const page = leadView.page;
    await page.getByRole('heading', { name: 'Monthly tallies', level: 1 }).waitFor();
    await page.getByRole('button', { name: `Start the ${lastMonth} tally` }).click();
    await page.waitForURL(/\/tallies\/\d+$/);
    const tallyPath = new URL(page.url()).pathname;
    const form = page.getByRole('form', { name: 'Monthly tally' });
    await form.waitFor();

    const panels = form.getByRole('region', { name: 'Panels' });
    const opening = await numberIn(panels.getByLabel('Opening stock'));
    const accepted = await numberIn(panels.getByLabel('Accepted', { exact: true }));
    expect(accepted).toBeGreaterThan(0); // prefilled from the month's parcels
    await panels.getByLabel('Used in assembly').fill('0');
    await panels.getByLabel('Closing stock').fill(String(opening + accepted));

    const blankets = form.getByRole('region', { name: 'Blankets' });
    const blanketsOpening = await numberIn(blankets.getByLabel('Opening stock'));
    const received = await numberIn(blankets.getByLabel('Finished blankets received'));
    await blankets.getByLabel('Closing stock').fill(String(blanketsOpening + received));

    // People served while no blanket was given out: a warning, not an error.
    const people = form.getByRole('region', { name: 'People served' });
    await people
      .getByLabel(/^Infants served by /)
      .first()
      .fill('4');
    await form
      .getByRole('region', { name: 'Hours, yarn and notes' })
      .getByLabel('Volunteer hours')
      .fill('12.5');

    const checks = page.getByRole('complementary', { name: 'Checks' });
    await checks
      .getByRole('region', { name: /^Warnings/ })
      .getByText(/reported as served, but no blankets were given out/i)
      .first()
      .waitFor();
    expect(await checks.getByRole('region', { name: /^Errors/ }).count()).toBe(0);
    await settled(page);
    await screenshot(page, 'tallies-1-form-with-warning');
    await submitTally(page, 'Four infants received baby blankets from our October stock.');
    await page.getByText('Submitted', { exact: true }).first().waitFor();

    // 2. The region's coordinator returns it with a comment.
    const reviewView = await as(suite.open(), '/review', coordinator.email, coordinator.password);
    const review = reviewView.page;
    await review.getByRole('heading', { name: 'Review tallies', level: 1 }).waitFor();
    await review.getByRole('link', { name: 'Alder Falls' }).first().click();
    await review.waitForURL(/\/review\/\d+$/);
    await review.getByRole('heading', { name: `Alder Falls, ${lastMonth}` }).waitFor();
    await screenshot(review, 'tallies-3-review-page');
    await review.getByRole('button', { name: 'Return to chapter' }).click();
    const giveBack = review.getByRole('dialog', { name: 'Return this tally to the chapter' });
    await giveBack
      .getByLabel('What should the chapter fix?')
      .fill('Infants served but no blanket given out: please add the given-out line.');
    await giveBack.getByRole('button', { name: 'Return to chapter' }).click();
    await review.getByText('Returned', { exact: true }).first().waitFor();

    // 3. The lead sees why, fixes the figures and submits again.
    await page.goto('/tallies');
    const returned = page.getByRole('region', { name: 'Returned for changes' });
    await returned.getByText(/please add the given-out line/).waitFor();
    await screenshot(page, 'tallies-4-home-returned');
    await page.goto(tallyPath);
    await form.waitFor();
    await people
      .getByLabel(/^Infants served by /)
      .first()
      .fill('0');
    await settled(page);
    await submitTally(page, 'Infants moved to next month, when the blankets go out.');

    // 4. The coordinator approves.
    await review.reload();
    await review.getByRole('button', { name: 'Approve' }).click();
    const approve = review.getByRole('dialog', { name: 'Approve this tally?' });
    await approve.getByRole('button', { name: 'Approve' }).click();
    await review.getByText('Approved', { exact: true }).first().waitFor();
    await screenshot(review, 'tallies-5-approved');

    // 5. The lead amends the approved tally: a new revision, the approved one kept.
    await page.goto(tallyPath);
    await page.getByRole('button', { name: 'Amend' }).click();
    const amend = page.getByRole('dialog', { name: 'Amend an approved tally' });
    await amend.getByLabel('Reason').fill('Two more hours of sorting were logged late.');
    await amend.getByRole('button', { name: 'Start the amendment' }).click();
    await form.waitFor();
    await form
      .getByRole('region', { name: 'Hours, yarn and notes' })
      .getByLabel('Volunteer hours')
      .fill('14.5');
    await settled(page);
    await page
      .getByRole('link', { name: /Compare with revision 1/ })
      .first()
      .waitFor();
    await screenshot(page, 'tallies-6-amendment-draft');

    // The server agrees: revision 2 is a draft, revision 1 still approved and unchanged.
    const id = Number(tallyPath.split('/').pop());
    const database = new Sequelize(process.env.DATABASE_URL!, {
      dialect: 'mariadb',
      logging: false,
    });
    const rows = await database
      .query<{ revision: number; state: string; hours: string }>(
        'SELECT revision, state, volunteer_hours AS hours FROM tally_revisions WHERE tally_id = ? ORDER BY revision',
        { replacements: [id], type: QueryTypes.SELECT },
      )
      .finally(() => database.close());
    expect(rows.map((r) => [r.revision, r.state, Number(r.hours)])).toEqual([
      [1, 'approved', 12.5],
      [2, 'draft', 14.5],
    ]);
  });
});

import type { Page } from 'playwright-core';
import { DEMO_SIGN_INS } from '../../db/seeders/demo-sign-ins';
import { screenshot } from './support/browser';
import { servedAppSuite } from './support/served-app';
import { signInThroughForm } from './support/sign-in';

const staff = DEMO_SIGN_INS.find((person) => person.role === 'national_staff')!;
const lead = DEMO_SIGN_INS.find((person) => person.role === 'chapter_lead')!;

jest.setTimeout(180_000);

/**
 * The snapshots are built by a background job after the app starts: reload until the period's
 * figures are in (a fresh demo database has none for a moment).
 */
async function figuresShown(page: Page): Promise<void> {
  const kpis = page.getByRole('list', { name: /^Figures for / });
  for (let attempt = 0; attempt < 30; attempt++) {
    await kpis.waitFor();
    const text = await kpis.innerText();
    if (/Panels received\s*[1-9]/.test(text)) return;
    await page.waitForTimeout(2_000);
    await page.reload();
  }
  throw new Error('the dashboard never showed any panels received');
}

describe('dashboards: staff read the network, a chapter lead reads their chapter', () => {
  const suite = servedAppSuite();

  it('staff open the network dashboard, change the period and drill down to a region', async () => {
    const watched = await suite.open();
    const { page } = watched;
    await page.goto('/dashboard');
    await signInThroughForm(page, staff.email, staff.password);
    await page.getByRole('heading', { level: 1, name: /^Whole network: / }).waitFor();
    await figuresShown(page);
    await screenshot(page, 'dashboard-1-network-month');

    await page.getByRole('group', { name: 'Period' }).getByLabel('Period').selectOption('quarter');
    await page.waitForURL(/periodKind=quarter/);
    await page.getByRole('heading', { level: 1, name: /^Whole network: Q[1-4] \d{4}/ }).waitFor();
    await figuresShown(page);
    await screenshot(page, 'dashboard-2-network-quarter');

    await page.getByRole('link', { name: 'North Ridge' }).first().click();
    await page.waitForURL(/\/dashboard\/regions\/\d+\?.*periodKind=quarter/);
    await page.getByRole('heading', { level: 1, name: /^North Ridge: Q[1-4] \d{4}/ }).waitFor();
    await figuresShown(page);
    // The region's breakdown lists its own chapters, and only those.
    await page.getByRole('link', { name: 'Alder Falls' }).first().waitFor();
    expect(await page.getByRole('link', { name: 'Brindle Bay' }).count()).toBe(0);
    await screenshot(page, 'dashboard-3-region-quarter');
  });

  it('a chapter lead sees their own chapter, and only that', async () => {
    const watched = await suite.open();
    const { page } = watched;
    await page.goto('/dashboard');
    await signInThroughForm(page, lead.email, lead.password);
    await page.waitForURL(/\/dashboard\/chapters\/\d+/);
    await page.getByRole('heading', { level: 1, name: /^Alder Falls: / }).waitFor();
    // The demo leaves Alder Falls' last month unfiled: a fiscal year has approved figures.
    await page
      .getByRole('group', { name: 'Period' })
      .getByLabel('Period')
      .selectOption('fiscal_year');
    await page.waitForURL(/periodKind=fiscal_year/);
    await figuresShown(page);
    expect(await page.getByText('Whole network').count()).toBe(0);
    expect(await page.getByText('Brindle Bay').count()).toBe(0);
    await screenshot(page, 'dashboard-4-chapter-lead');

    // The network's figures are not theirs: the server refuses, whatever the address bar says.
    const chapterPath = new URL(page.url()).pathname;
    const otherChapter = Number(chapterPath.split('/').pop()) + 1;
    await page.goto(`/dashboard/chapters/${otherChapter}`);
    await page
      .getByText(/not found|could not be loaded|no access/i)
      .first()
      .waitFor();
    expect(await page.getByRole('list', { name: /^Figures for / }).count()).toBe(0);
    // That refusal is the one console error this page should log.
    const refused = watched.problems.filter((problem) => /status of 404/.test(problem));
    expect(refused.length).toBeGreaterThan(0);
    watched.problems.splice(
      0,
      watched.problems.length,
      ...watched.problems.filter((p) => !refused.includes(p)),
    );
  });
});

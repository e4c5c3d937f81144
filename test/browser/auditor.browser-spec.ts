import type { Locator, Page } from 'playwright-core';
import { DEMO_SIGN_INS } from '../../db/seeders/demo-sign-ins';
import { screenshot } from './support/browser';
import { servedAppSuite } from './support/served-app';
import { signInThroughForm } from './support/sign-in';

const auditor = DEMO_SIGN_INS.find((person) => person.role === 'auditor')!;

jest.setTimeout(300_000);

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

/** The first tally line on the trace page with a scanned receipt behind it. */
async function lineWithScans(lines: Locator): Promise<Locator> {
  const rows = lines.getByRole('row');
  const count = await rows.count();
  for (let index = 1; index < count; index++) {
    const cells = rows.nth(index).getByRole('cell');
    // The last column counts the scans of the line's receipts.
    if (Number(await cells.last().innerText()) > 0) return rows.nth(index);
  }
  throw new Error('no tally on the first page of the trace has a scanned receipt');
}

/** A quarter of the demo history with scanned parcels in every region. */
const QUARTER = '2025-Q4';

describe('auditor: trace a figure to a scan, then sample receipts and conclude', () => {
  const suite = servedAppSuite();

  it('traces a network figure down to a parcel and its scan', async () => {
    const { page } = await suite.open();
    await page.goto('/dashboard');
    await signInThroughForm(page, auditor.email, auditor.password);
    await page.getByRole('heading', { level: 1, name: /^Whole network: / }).waitFor();
    const period = page.getByRole('group', { name: 'Period' });
    await period.getByLabel('Period').selectOption('quarter');
    await page.waitForURL(/periodKind=quarter/);
    // A quarter of the demo history that no other suite files tallies in: this quarter's figure
    // could change between the dashboard and its trace while other suites approve tallies. By
    // its address, which the picker keeps whether or not the quarter is still a recent one.
    await page.goto(`/dashboard?periodKind=quarter&period=${QUARTER}`);
    await page.getByRole('heading', { level: 1, name: /^Whole network: Q4 2025/ }).waitFor();
    await expect(period.getByLabel('Quarter').inputValue()).resolves.toBe(QUARTER);
    await figuresShown(page);
    await screenshot(page, 'auditor-1-network-dashboard');

    const card = page
      .getByRole('list', { name: /^Figures for / })
      .getByRole('listitem', { name: 'Panels received' });
    const figure = (await card.getByRole('link').innerText()).trim();
    await card.getByRole('link').click();
    await page.waitForURL(new RegExp(`/trace/network%3A${QUARTER}\\?measure=panelsAccepted`));
    await page.getByText('Agrees', { exact: true }).waitFor();
    // The figure on the dashboard is the one traced, and the tallies re-add to it.
    const figures = page.getByRole('table', { name: 'Figure and re-added total' });
    await expect(figures.getByRole('row').nth(1).innerText()).resolves.toMatch(
      new RegExp(`Panels received\\s+${figure}\\s+${figure}\\s+Matches`),
    );
    await screenshot(page, 'auditor-2-trace-agrees');

    const lines = page.getByRole('table', { name: /^Approved tally revisions/ });
    const line = await lineWithScans(lines);
    await line.getByRole('button', { name: /^Show amendments and receipts of / }).click();
    const receipts = page.getByRole('table', { name: /^Parcel receipts of / });
    const scan = receipts.getByRole('link', { name: /^Open scan / }).first();
    await scan.waitFor();
    await screenshot(page, 'auditor-3-trace-receipts');

    // The scan opens in a tab of its own, fetched with the auditor's sign-in.
    const [scanTab] = await Promise.all([page.context().waitForEvent('page'), scan.click()]);
    await scanTab.waitForLoadState();
    expect(scanTab.url()).toMatch(/^blob:/);
    // A blob tab shows the bare image; wait until it has been decoded before capturing it.
    await scanTab.bringToFront();
    await scanTab.waitForFunction(() => {
      const image = document.querySelector('img');
      return image !== null && image.complete && image.naturalWidth > 0;
    });
    await screenshot(scanTab, 'auditor-4-scan');
    await scanTab.close();

    // The parcel itself, with the same scan on its page.
    const scannedRow = receipts
      .getByRole('row')
      .filter({ has: page.getByRole('link', { name: /^Open scan / }) });
    await scannedRow
      .first()
      .getByRole('link', { name: /^Parcel / })
      .click();
    await page.waitForURL(/\/receipts\/\d+$/);
    await page
      .getByRole('img', { name: /^Scan: / })
      .first()
      .waitFor();
    await screenshot(page, 'auditor-5-receipt-with-scan');
  });

  it('draws a sample of one quarter’s parcels, records two deviations and reads the conclusion', async () => {
    const { page } = await suite.open();
    await page.goto('/samples');
    await signInThroughForm(page, auditor.email, auditor.password);
    const form = page.getByRole('form', { name: 'Plan a sample' });
    await form.waitFor();
    await form.getByRole('radio', { name: 'Parcel receipts' }).check();
    // The period picker starts on the last complete quarter.
    await expect(form.getByLabel('Period').inputValue()).resolves.toMatch(/^\d{4}-Q[1-4]$/);
    await form.getByRole('radio', { name: '90 %' }).check();
    await form.getByLabel('Tolerable deviation rate (%)').fill('20');
    const size = form.getByRole('group', { name: 'Sample size' });
    // Source: AICPA Audit Sampling guide (2017), Table A-2: 10 % risk, 20 % tolerable, 0 expected → 11.
    await size.getByText('Sample size: 11 items').waitFor();
    await size.getByText(/^Population: [\d,]+ parcel receipts$/).waitFor();
    await size.getByText('Items to draw: 11').waitFor();
    await screenshot(page, 'auditor-6-plan-sample');

    await form.getByRole('button', { name: 'Draw the sample' }).click();
    await page.waitForURL(/\/samples\/\d+$/);
    const plan = page.getByRole('region', { name: 'Seed and plan' });
    // The seed is shown, so anyone can re-draw the same items.
    await plan.getByText('Seed', { exact: true }).waitFor();
    await expect(plan.getByRole('definition').first().innerText()).resolves.toMatch(/\S{8,}/);
    const items = page.getByRole('table', { name: 'Sampled items' });
    await expect(items.getByRole('row').count()).resolves.toBe(12);
    await page.getByText('0 of 11 recorded').waitFor();
    await screenshot(page, 'auditor-7-worksheet-drawn');

    const rows = items.getByRole('row');
    for (const [index, note] of [
      [1, 'Label shows 40 panels; 48 were logged as accepted.'],
      [2, 'No scan of the packing slip; the count cannot be checked.'],
    ] as const) {
      await rows
        .nth(index)
        .getByRole('button', { name: /^Deviation…: / })
        .click();
      const dialog = page.getByRole('dialog', { name: /: worksheet entry$/ });
      await dialog.getByLabel('Note').fill(note);
      await dialog.getByRole('button', { name: 'Record' }).click();
      await dialog.waitFor({ state: 'detached' });
      await page.getByText(`${index} of 11 recorded`).waitFor();
    }
    await screenshot(page, 'auditor-8-two-deviations');

    for (let recorded = 3; recorded <= 11; recorded++) {
      await items
        .getByRole('button', { name: /^Agrees: / })
        .first()
        .click();
      await page.getByText(`${recorded} of 11 recorded`).waitFor();
    }
    const conclusion = page.getByRole('status', { name: 'Conclusion' });
    await conclusion.waitFor();
    // Two deviations in eleven items put the upper limit far above a 20 % tolerable rate.
    await expect(conclusion.innerText()).resolves.toMatch(/Does not support reliance/);
    await expect(conclusion.innerText()).resolves.toMatch(
      /The upper deviation limit, [\d.]+ %, is above the tolerable rate of 20 %/,
    );
    await expect(page.getByRole('region', { name: 'Result' }).innerText()).resolves.toMatch(
      /Deviations found\s+2/,
    );
    await screenshot(page, 'auditor-9-conclusion');
  });
});

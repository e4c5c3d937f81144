import { getConnectionToken } from '@nestjs/sequelize';
import {
  TRACE_MEASURES,
  traceReference,
  type ApiErrorBody,
  type DashboardView,
  type SnapshotView,
  type TraceMeasure,
  type TraceTallyLine,
  type TraceView,
} from '@tallyloom/core';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { SnapshotBuilder } from '../../services/api/src/reports/snapshot-builder.service';
import { caller } from './fixtures/tallies';
import { signedIn } from './support/people-builders';
import { startTestApp, type TestApp } from './support/test-app';

// Sixty traces of whole regions and the network, each with its tallies and receipts.
jest.setTimeout(600_000);

// The demo's last complete fiscal year (it starts in July): every demo chapter has approved months.
const FISCAL_YEAR = 'FY2026';
const DASHBOARD = `/api/dashboards/network?periodKind=fiscal_year&period=${FISCAL_YEAR}`;
// Demo regions and chapters: other suites build regions of their own, so these hold still.
const HOME_REGION = 'North Ridge';
const AMENDED_CHAPTER = 'Alder Falls';

describe('trace of a figure to its tallies, receipts and scans, on the demo network', () => {
  let testApp: TestApp;
  let sequelize: Sequelize;
  let auditor: string;
  let regionIds: Map<string, number>;

  const select = <T extends object>(sql: string, replacements: Record<string, unknown> = {}) =>
    sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements });
  const trace = (token: string, reference: string, measure?: string) =>
    caller(testApp, token).get(
      `/api/trace/${reference}${measure === undefined ? '' : `?measure=${measure}`}`,
    );
  const fieldsOf = (body: unknown) =>
    ((body as ApiErrorBody).fields ?? []).map((problem) => problem.field);
  const referenceOf = (view: SnapshotView) =>
    traceReference(view.scope, view.scopeId, view.period.key);

  beforeAll(async () => {
    testApp = await startTestApp();
    sequelize = testApp.app.get<Sequelize>(getConnectionToken());
    // Snapshots as of now, so the dashboard and the trace read rows built from today's approvals.
    await testApp.app.get(SnapshotBuilder).rebuildAll();
    auditor = (await signedIn(testApp, 'auditor')).token;
    const regions = await select<{ id: number; name: string }>('SELECT id, name FROM regions');
    regionIds = new Map(regions.map((region) => [region.name, Number(region.id)]));
  });
  afterAll(() => testApp.close());

  async function networkDashboard(): Promise<DashboardView> {
    const response = await caller(testApp, auditor).get(DASHBOARD);
    expect(response.status).toBe(200);
    return response.body as DashboardView;
  }

  describe('every figure of the network dashboard re-adds from its tallies', () => {
    it('for the network and each region, measure by measure', async () => {
      let dashboard = await networkDashboard();
      const demoRows = dashboard.breakdown.filter((row) => row.figures.approvedTallies > 0);
      // Two years of demo history: the check covers real figures, not empty rows.
      expect(dashboard.current.figures.approvedTallies).toBeGreaterThan(100);
      expect(demoRows.length).toBeGreaterThanOrEqual(4);

      const problems: string[] = [];
      for (let index = 0; index <= dashboard.breakdown.length; index++) {
        for (const measure of TRACE_MEASURES) {
          // Other suites' approvals rebuild the network row while this runs: on a mismatch the
          // dashboard is read again (at most twice), so a figure is compared with its own rebuild.
          let outcome = '';
          for (let attempt = 0; attempt < 3; attempt++) {
            const view = index === 0 ? dashboard.current : dashboard.breakdown[index - 1];
            outcome = await compare(view, measure);
            if (outcome === 'agrees') break;
            dashboard = await networkDashboard();
          }
          if (outcome !== 'agrees') problems.push(outcome);
        }
      }
      expect(problems).toEqual([]);
    });

    async function compare(view: SnapshotView, measure: TraceMeasure): Promise<string> {
      const reference = referenceOf(view);
      const response = await trace(auditor, reference, measure);
      const label = `${reference} ${measure}`;
      // A scope with no approved tally in the year may have no stored row: nothing to trace.
      if (response.status === 404 && view.figures.approvedTallies === 0) return 'agrees';
      if (response.status !== 200) return `${label}: ${response.status}`;
      const body = response.body as TraceView;
      const shown = view.figures[measure];
      if (body.measure !== measure) return `${label}: traced ${String(body.measure)}`;
      if (body.figure[measure] !== shown)
        return `${label}: figure ${body.figure[measure]} ≠ dashboard ${shown}`;
      if (body.recomputed[measure] !== shown)
        return `${label}: recomputed ${body.recomputed[measure]} ≠ dashboard ${shown}`;
      if (!body.agrees) return `${label}: agrees is false`;
      if (body.tallies.length !== view.figures.approvedTallies)
        return `${label}: ${body.tallies.length} tallies ≠ ${view.figures.approvedTallies}`;
      return 'agrees';
    }

    it('traces every measure at once when none is named', async () => {
      const dashboard = await networkDashboard();
      const row = dashboard.breakdown.find((view) => view.scopeName === HOME_REGION)!;
      const response = await trace(auditor, referenceOf(row));
      expect(response.status).toBe(200);
      const body = response.body as TraceView;
      expect(body.measure).toBeNull();
      expect(body.agrees).toBe(true);
      for (const measure of TRACE_MEASURES) {
        expect(`${measure}: ${body.figure[measure]}`).toBe(`${measure}: ${row.figures[measure]}`);
        expect(`${measure}: ${body.recomputed[measure]}`).toBe(
          `${measure}: ${row.figures[measure]}`,
        );
      }
      expect(body).toMatchObject({
        reference: `region:${regionIds.get(HOME_REGION)}:${FISCAL_YEAR}`,
        scope: 'region',
        scopeName: HOME_REGION,
        period: { kind: 'fiscal_year', key: FISCAL_YEAR, from: '2025-07', to: '2026-06' },
      });
    });
  });

  describe('a chapter-month down to its parcel receipts and scans', () => {
    let line: TraceTallyLine;

    beforeAll(async () => {
      // A chapter-month of the home region whose tally matched its receipts, with a scan.
      const [chosen] = await select<{ chapter_id: number; month: string }>(
        `SELECT t.chapter_id, DATE_FORMAT(t.month, '%Y-%m') AS month
           FROM monthly_tallies t
           JOIN chapters c ON c.id = t.chapter_id
           JOIN tally_revisions r ON r.tally_id = t.id AND r.revision = t.approved_revision
          WHERE c.region_id = :regionId AND t.month BETWEEN '2025-07-01' AND '2026-06-01'
            AND r.receipts_difference_reason IS NULL AND r.panels_accepted > 0
            AND EXISTS (SELECT 1 FROM parcel_receipts p JOIN receipt_scans s ON s.receipt_id = p.id
                         WHERE p.chapter_id = t.chapter_id
                           AND p.received_on BETWEEN t.month AND LAST_DAY(t.month))
          ORDER BY t.month, t.chapter_id LIMIT 1`,
        { regionId: regionIds.get(HOME_REGION) },
      );
      expect(chosen).toBeDefined();
      const response = await trace(
        auditor,
        `region:${regionIds.get(HOME_REGION)}:${FISCAL_YEAR}`,
        'panelsAccepted',
      );
      expect(response.status).toBe(200);
      const found = (response.body as TraceView).tallies.find(
        (tally) => tally.chapterId === Number(chosen.chapter_id) && tally.month === chosen.month,
      );
      expect(found).toBeDefined();
      line = found!;
    });

    it("lists exactly the chapter's receipts of the month, adding up to the tally's panels", async () => {
      const receipts = await select<{ id: number; panels_accepted: number }>(
        `SELECT id, panels_accepted FROM parcel_receipts
          WHERE chapter_id = :chapterId AND DATE_FORMAT(received_on, '%Y-%m') = :month
          ORDER BY received_on, id`,
        { chapterId: line.chapterId, month: line.month },
      );
      expect(line.receipts.map((receipt) => receipt.id)).toEqual(
        receipts.map((receipt) => Number(receipt.id)),
      );
      const sum = line.receipts.reduce((total, receipt) => total + receipt.panelsAccepted, 0);
      expect(sum).toBe(
        receipts.reduce((total, receipt) => total + Number(receipt.panels_accepted), 0),
      );
      // The tally gave no reason for a difference, so its accepted panels are the receipts' sum.
      expect(line.value.panelsAccepted).toBe(sum);
      const [revision] = await select<{ panels_accepted: number; approver: string }>(
        `SELECT r.panels_accepted, u.display_name AS approver FROM tally_revisions r
           LEFT JOIN users u ON u.id = r.approved_by
          WHERE r.tally_id = :tallyId AND r.revision = :revision`,
        { tallyId: line.tallyId, revision: line.revision },
      );
      expect(line.value.panelsAccepted).toBe(Number(revision.panels_accepted));
      expect(line.approvedBy).toBe(revision.approver);
      expect(line.approvedAt).toMatch(/^\d{4}-\d{2}-\d{2}T/);
    });

    it('lists the scans with addresses that download for the auditor', async () => {
      const scanned = line.receipts.filter((receipt) => receipt.scanCount > 0);
      expect(scanned.length).toBeGreaterThan(0);
      for (const receipt of scanned) {
        expect(receipt.scans).toHaveLength(receipt.scanCount);
        for (const scan of receipt.scans) {
          const file = await caller(testApp, auditor).get(scan.url);
          expect(`${scan.url} → ${file.status}`).toBe(`${scan.url} → 200`);
          expect(file.headers['content-type']).toMatch(/^image\/png/);
        }
      }
    });
  });

  describe('an amended tally', () => {
    it('shows the reason and the before and after of each changed field', async () => {
      const [amended] = await select<{ tally_id: number; chapter_id: number; month: string }>(
        `SELECT t.id AS tally_id, t.chapter_id, DATE_FORMAT(t.month, '%Y-%m') AS month
           FROM monthly_tallies t JOIN chapters c ON c.id = t.chapter_id
          WHERE c.name = :chapter AND t.approved_revision = 2
          ORDER BY t.month DESC LIMIT 1`,
        { chapter: AMENDED_CHAPTER },
      );
      expect(amended).toBeDefined();
      const revisions = await select<{
        revision: number;
        amendment_reason: string | null;
        panels_used: number;
        panels_closing: number;
      }>(
        `SELECT revision, amendment_reason, panels_used, panels_closing FROM tally_revisions
          WHERE tally_id = :tallyId ORDER BY revision`,
        { tallyId: amended.tally_id },
      );
      const [first, second] = revisions;

      const response = await trace(auditor, `chapter:${amended.chapter_id}:${amended.month}`);
      expect(response.status).toBe(200);
      const body = response.body as TraceView;
      expect(body.agrees).toBe(true);
      expect(body.tallies).toHaveLength(1);
      const [tally] = body.tallies;
      expect(tally).toMatchObject({ tallyId: Number(amended.tally_id), revision: 2 });
      expect(tally.value.panelsInStock).toBe(Number(second.panels_closing));
      // The demo's amendment corrected panels used after a recount, and with it the closing stock.
      expect(tally.amendments).toEqual([
        {
          revision: 2,
          reason: second.amendment_reason,
          changes: [
            {
              field: 'panels.usedInAssembly',
              label: expect.any(String) as string,
              before: Number(first.panels_used),
              after: Number(second.panels_used),
            },
            {
              field: 'panels.closing',
              label: expect.any(String) as string,
              before: Number(first.panels_closing),
              after: Number(second.panels_closing),
            },
          ],
        },
      ]);
      expect(second.amendment_reason).toMatch(/\w/);
    });
  });

  describe('scope and bad input', () => {
    let homeRegionId: number;
    let awayRegionId: number;
    let homeChapterId: number;
    let awayChapterId: number;

    beforeAll(async () => {
      homeRegionId = regionIds.get(HOME_REGION)!;
      awayRegionId = regionIds.get('Riverlands')!;
      const chapterIn = async (regionId: number) =>
        Number(
          (
            await select<{ id: number }>(
              'SELECT id FROM chapters WHERE region_id = :regionId ORDER BY id LIMIT 1',
              { regionId },
            )
          )[0].id,
        );
      homeChapterId = await chapterIn(homeRegionId);
      awayChapterId = await chapterIn(awayRegionId);
    });

    it("lets a coordinator trace their region's figures, and finds no other region's (404)", async () => {
      const { token } = await signedIn(testApp, 'regional_coordinator', { regionId: homeRegionId });
      expect(
        (await trace(token, `region:${homeRegionId}:${FISCAL_YEAR}`, 'panelsAccepted')).status,
      ).toBe(200);
      expect((await trace(token, `chapter:${homeChapterId}:2026-03`, 'blanketsGiven')).status).toBe(
        200,
      );
      expect((await trace(token, `region:${awayRegionId}:${FISCAL_YEAR}`)).status).toBe(404);
      expect((await trace(token, `chapter:${awayChapterId}:2026-03`)).status).toBe(404);
      expect((await trace(token, `network:${FISCAL_YEAR}`)).status).toBe(404);
    });

    it("lets a chapter lead trace only their chapter's figures", async () => {
      const { token } = await signedIn(testApp, 'chapter_lead', { chapterId: homeChapterId });
      const own = await trace(token, `chapter:${homeChapterId}:2026-Q1`, 'volunteerHours');
      expect(own.status).toBe(200);
      expect((own.body as TraceView).agrees).toBe(true);
      expect((await trace(token, `region:${homeRegionId}:2026-Q1`)).status).toBe(404);
      expect((await trace(token, `chapter:${awayChapterId}:2026-Q1`)).status).toBe(404);
    });

    it('refuses grant writers (403): a trace lists tallies and receipts, not aggregates', async () => {
      const { token } = await signedIn(testApp, 'grant_writer');
      expect((await trace(token, `network:${FISCAL_YEAR}`, 'panelsAccepted')).status).toBe(403);
    });

    it.each([
      ['a custom range', 'network:2025-07..2026-06'],
      ['no scope', 'FY2026'],
      ['an unknown scope', `galaxy:1:${FISCAL_YEAR}`],
      ['a region without an id', `region:${FISCAL_YEAR}`],
      ['a thirteenth month', 'network:2026-13'],
    ])('answers a reference with %s with a 400 naming reference', async (_, reference) => {
      const response = await trace(auditor, reference);
      expect(response.status).toBe(400);
      expect(fieldsOf(response.body)).toEqual(['reference']);
    });

    it('answers an unknown measure with a 400 naming measure', async () => {
      const response = await trace(auditor, `network:${FISCAL_YEAR}`, 'panelsKnitted');
      expect(response.status).toBe(400);
      expect(fieldsOf(response.body)).toEqual(['measure']);
    });

    it('finds no figure for a region period no snapshot was built for (404)', async () => {
      const response = await trace(auditor, `region:${homeRegionId}:2009-01`);
      expect(response.status).toBe(404);
    });

    it("traces a chapter's month without tallies to nothing: zero, agreeing, no lines", async () => {
      // Chapters are read live, so every period of a chapter has figures, if only zeros.
      const response = await trace(auditor, `chapter:${homeChapterId}:2009-01`, 'panelsAccepted');
      expect(response.status).toBe(200);
      const view = response.body as TraceView;
      expect(view.figure).toEqual({ panelsAccepted: 0 });
      expect(view.agrees).toBe(true);
      expect(view.tallies).toEqual([]);
    });
  });
});

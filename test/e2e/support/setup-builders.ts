import type { INestApplication } from '@nestjs/common';
import { getModelToken } from '@nestjs/sequelize';
import type { AgencyKind, ApiErrorBody } from '@tallyloom/core';
import { AgencyChapter } from '../../../services/api/src/agencies/models/agency-chapter.model';
import { PartnerAgency } from '../../../services/api/src/agencies/models/partner-agency.model';
import { AuditEntry } from '../../../services/api/src/audit/models/audit-entry.model';
import { BlanketSize } from '../../../services/api/src/blanket-sizes/models/blanket-size.model';
import { Campaign } from '../../../services/api/src/campaigns/models/campaign.model';
import { VolunteerHourValue } from '../../../services/api/src/settings/models/volunteer-hour-value.model';
import { uniqueSuffix } from './test-app';

/** A partner agency that belongs to one test: `anAgency().servedBy(chapterId).build(app)`. */
export function anAgency() {
  const suffix = uniqueSuffix();
  const fields = {
    name: `Test Agency ${suffix}`,
    kind: 'family_shelter' as AgencyKind,
    active: true,
    chapterIds: [] as number[],
  };
  const builder = {
    named(value: string) {
      fields.name = `${value} ${suffix}`;
      return builder;
    },
    ofKind(kind: AgencyKind) {
      fields.kind = kind;
      return builder;
    },
    servedBy(...chapterIds: number[]) {
      fields.chapterIds.push(...chapterIds);
      return builder;
    },
    inactive() {
      fields.active = false;
      return builder;
    },
    async build(app: INestApplication): Promise<PartnerAgency> {
      const agency = await app.get<typeof PartnerAgency>(getModelToken(PartnerAgency)).create({
        name: fields.name,
        kind: fields.kind,
        active: fields.active,
      });
      await app
        .get<typeof AgencyChapter>(getModelToken(AgencyChapter))
        .bulkCreate(fields.chapterIds.map((chapterId) => ({ agencyId: agency.id, chapterId })));
      return agency;
    },
  };
  return builder;
}

/** A campaign that belongs to one test, network-wide unless `inRegion` says otherwise. */
export function aCampaign() {
  const suffix = uniqueSuffix();
  const fields = {
    code: `T-${suffix}`,
    name: `Test Drive ${suffix}`,
    goalPanels: 1000,
    startsOn: '2025-11-01',
    endsOn: '2026-02-28',
    regionId: null as number | null,
  };
  const builder = {
    inRegion(regionId: number) {
      fields.regionId = regionId;
      return builder;
    },
    running(startsOn: string, endsOn: string) {
      fields.startsOn = startsOn;
      fields.endsOn = endsOn;
      return builder;
    },
    build(app: INestApplication): Promise<Campaign> {
      return app.get<typeof Campaign>(getModelToken(Campaign)).create({ ...fields });
    },
  };
  return builder;
}

/** A blanket size catalogue entry that belongs to one test. */
export function aBlanketSize() {
  const suffix = uniqueSuffix();
  const fields = {
    name: `Test Size ${suffix}`,
    columns: 5,
    rows: 5,
    sortOrder: 900,
    active: true,
  };
  const builder = {
    withGrid(columns: number, rows: number) {
      fields.columns = columns;
      fields.rows = rows;
      return builder;
    },
    inactive() {
      fields.active = false;
      return builder;
    },
    build(app: INestApplication): Promise<BlanketSize> {
      return app.get<typeof BlanketSize>(getModelToken(BlanketSize)).create({ ...fields });
    },
  };
  return builder;
}

/** A request id of our own, so the audit entries of one request can be found among everyone's. */
export const aRequestId = (what: string) => `setup-${what}-${uniqueSuffix().toLowerCase()}`;

/** The audit entries one request wrote, oldest first, with their JSON parsed. */
export async function auditedBy(app: INestApplication, requestId: string) {
  const entries = app.get<typeof AuditEntry>(getModelToken(AuditEntry));
  const rows = await entries.findAll({ where: { requestId }, order: [['id', 'ASC']] });
  return rows.map((row) => ({
    action: row.action,
    entityType: row.entityType,
    entityId: row.entityId,
    actorUserId: row.actorUserId,
    before: parsedJson(row.beforeJson),
    after: parsedJson(row.afterJson),
  }));
}

/** JSON columns may come back parsed or as text, depending on the driver. */
function parsedJson(value: unknown): Record<string, unknown> | null {
  if (value === null || value === undefined) return null;
  return (typeof value === 'string' ? JSON.parse(value) : value) as Record<string, unknown>;
}

/** The fields a 400 or 409 names, in order. */
export function fieldsNamed(body: unknown): string[] {
  return ((body as ApiErrorBody).fields ?? []).map((problem) => problem.field);
}

/**
 * Path values for the route-table test's set-up routes: a row in the home scope (the chapter
 * lead's chapter, the coordinator's region) and one only in the away scope. Blanket sizes and
 * volunteer hour values are network-wide and written by admins only, so one row serves both.
 */
export async function networkSetupRouteParams(
  app: INestApplication,
  scope: {
    homeRegionId: number;
    homeChapterId: number;
    awayRegionId: number;
    awayChapterId: number;
  },
): Promise<Record<string, { inScope: string; outOfScope: string }>> {
  const ours = await anAgency().servedBy(scope.homeChapterId).build(app);
  const theirs = await anAgency().servedBy(scope.awayChapterId).build(app);
  const ourDrive = await aCampaign().inRegion(scope.homeRegionId).build(app);
  const theirDrive = await aCampaign().inRegion(scope.awayRegionId).build(app);
  const size = String((await aBlanketSize().build(app)).id);
  const values = app.get<typeof VolunteerHourValue>(getModelToken(VolunteerHourValue));
  const anyValue = await values.findOne({ order: [['id', 'ASC']] });
  if (!anyValue) throw new Error('the demo seed stores volunteer hour values; none found');
  const value = String(anyValue.id);
  return {
    '/api/agencies/:id': { inScope: String(ours.id), outOfScope: String(theirs.id) },
    '/api/campaigns/:id': { inScope: String(ourDrive.id), outOfScope: String(theirDrive.id) },
    '/api/blanket-sizes/:id': { inScope: size, outOfScope: size },
    '/api/settings/volunteer-hour-values/:id': { inScope: value, outOfScope: value },
  };
}

import {
  BadRequestException,
  ForbiddenException,
  GoneException,
  Injectable,
  Logger,
  NotFoundException,
} from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import {
  addMonths,
  can,
  type ExportView,
  type ImpactPackRequest,
  type ImpactPackScope,
  type Page,
  type Period,
  type SnapshotExportParams,
} from '@tallyloom/core';
import type { Readable } from 'node:stream';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import { Campaign } from '../campaigns/models/campaign.model';
import { Chapter } from '../chapters/models/chapter.model';
import type { Actor } from '../common/access/actor';
import { chapterScope, regionScope, within } from '../common/access/scope';
import type { SignedInContext } from '../common/context/request-context';
import { invalidField } from '../common/validation/field-errors';
import { AppConfig } from '../config/app-config';
import { resolvePeriod } from '../dashboards/dashboard-period';
import { DashboardsService } from '../dashboards/dashboards.service';
import { Region } from '../regions/models/region.model';
import { SettingsService } from '../settings/settings.service';
import { FileStorage, StoredFileMissing } from '../storage/file-storage';
import type { ImpactPackDto, ListExportsQuery, TableExportDto } from './dto/export-requests.dto';
import { downloadPath, exportSignatureValid } from './export-links';
import { ExportQueue } from './export-queue.service';
import { exportFileName, TABLE_LABELS, TABLE_READ_POLICY, validFilters } from './export-requests';
import { ExportRecord } from './models/export-record.model';
import { snapshotDashboard } from './producers/snapshots-export.producer';

export const EXPORT_ENTITY = 'export';

const notFound = () => new NotFoundException('No such export.');

const CONTENT_TYPES = {
  // Source: IANA media types: the Office Open XML spreadsheet type, and text/csv (RFC 4180 §3).
  xlsx: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
  csv: 'text/csv; charset=utf-8',
} as const;

export interface ExportFile {
  stream: Readable;
  fileName: string;
  contentType: string;
  sizeBytes: number | null;
}

/** Export requests, the requester's own list, and the signed download. */
@Injectable()
export class ExportsService {
  private readonly logger = new Logger('Exports');

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(ExportRecord) private readonly exports: typeof ExportRecord,
    @InjectModel(Region) private readonly regions: typeof Region,
    @InjectModel(Chapter) private readonly chapters: typeof Chapter,
    @InjectModel(Campaign) private readonly campaigns: typeof Campaign,
    private readonly settings: SettingsService,
    private readonly audit: AuditService,
    private readonly queue: ExportQueue,
    private readonly storage: FileStorage,
    private readonly config: AppConfig,
    private readonly dashboards: DashboardsService,
  ) {}

  async requestTable(context: SignedInContext, body: TableExportDto): Promise<ExportView> {
    const { actor } = context;
    if (!can(actor.role, TABLE_READ_POLICY[body.table]))
      throw new ForbiddenException(`Your role may not read the ${body.table} table.`);
    const filters = await validFilters(body.table, body.filters);
    const where = await this.placeNames(actor, filters);
    if (body.table === 'snapshots')
      await this.checkDashboard(actor, filters as unknown as SnapshotExportParams);
    const now = new Date();
    const description = [TABLE_LABELS[body.table], ...where, rangeOf(filters)]
      .filter(Boolean)
      .join(' · ');
    return this.create(context, {
      kind: 'table',
      tableName: body.table,
      format: body.format,
      params: { format: body.format, bom: body.format === 'csv' && body.bom === true, filters },
      description,
      fileName: exportFileName(body.table, body.format, now),
    });
  }

  async requestImpactPack(context: SignedInContext, body: ImpactPackDto): Promise<ExportView> {
    const { scope, scopeId, ...periodQuery } = body;
    const { fiscalYearStartMonth } = await this.settings.current();
    const lastComplete = addMonths(new Date().toISOString().slice(0, 7), -1);
    const period = resolvePeriod(periodQuery, fiscalYearStartMonth, lastComplete);
    let scopeName = 'Whole network';
    if (scope === 'network') {
      if (scopeId !== undefined) throw invalidField('scopeId', 'The network takes no scopeId.');
    } else {
      if (scopeId === undefined)
        throw invalidField('scopeId', `scopeId is required for a ${scope}.`);
      scopeName = await this.impactScopeName(context.actor, scope, scopeId);
    }
    return this.create(context, {
      kind: 'impact-pack',
      tableName: null,
      format: 'xlsx',
      // The producer's own request, with the period resolved now: a queued pack keeps the
      // period the person saw, even if the month turns before the job runs.
      params: impactPackParams(scope, scopeId, period),
      description: `Impact pack · ${scopeName} · ${period.label}`,
      fileName: exportFileName('impact-pack', 'xlsx', new Date()),
    });
  }

  async list(actor: Actor, query: ListExportsQuery): Promise<Page<ExportView>> {
    const page = query.page ?? 1;
    const pageSize = query.pageSize ?? 25;
    const { rows, count } = await this.exports.findAndCountAll({
      where: { requestedBy: actor.id },
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
      limit: pageSize,
      offset: (page - 1) * pageSize,
    });
    return { items: rows.map((row) => this.toView(row)), total: count, page, pageSize };
  }

  /** One's own exports only: anyone else's is not found. */
  async get(actor: Actor, id: string): Promise<ExportView> {
    const row = await this.exports.findOne({ where: { id, requestedBy: actor.id } });
    if (!row) throw notFound();
    return this.toView(row);
  }

  /** The signed link: a bad signature is not found; a link past its time is gone. */
  async file(
    id: string,
    expires: number | undefined,
    signature: string | undefined,
  ): Promise<ExportFile> {
    if (
      expires === undefined ||
      signature === undefined ||
      !exportSignatureValid(this.config.exportLinkSecret, id, expires, signature)
    )
      throw notFound();
    const row = await this.exports.findByPk(id);
    if (!row) throw notFound();
    const gone = () => new GoneException('This download link has expired; export the table again.');
    if (expires * 1000 <= Date.now() || row.state === 'expired') throw gone();
    if (row.state !== 'done' || !row.fileKey) throw notFound();
    try {
      return {
        stream: await this.storage.get(row.fileKey),
        fileName: row.fileName,
        contentType: CONTENT_TYPES[row.format],
        sizeBytes: row.sizeBytes === null ? null : Number(row.sizeBytes),
      };
    } catch (error) {
      if (error instanceof StoredFileMissing) throw gone();
      throw error;
    }
  }

  toView(row: ExportRecord): ExportView {
    const done = row.state === 'done' && row.expiresAt !== null;
    return {
      id: row.id,
      kind: row.kind,
      table: row.tableName,
      format: row.format,
      state: row.state,
      progress: row.progress,
      rows: row.rowCount,
      sheets: row.sheetCount,
      fileName: row.fileName,
      description: row.description,
      createdAt: row.createdAt.toISOString(),
      finishedAt: row.finishedAt?.toISOString() ?? null,
      expiresAt: row.expiresAt?.toISOString() ?? null,
      downloadUrl: done ? downloadPath(this.config.exportLinkSecret, row.id, row.expiresAt!) : null,
      error: row.state === 'failed' ? row.error : null,
    };
  }

  /** The row and its audit entry in one transaction; the job is queued once both are committed. */
  private async create(
    context: SignedInContext,
    values: Pick<
      ExportRecord,
      'kind' | 'tableName' | 'format' | 'params' | 'description' | 'fileName'
    >,
  ): Promise<ExportView> {
    const id = crypto.randomUUID();
    await this.sequelize.transaction(async (transaction) => {
      await this.exports.create(
        { ...values, id, requestedBy: context.actor.id, state: 'queued', createdAt: new Date() },
        { transaction },
      );
      await this.audit.record(
        context,
        {
          action: 'export.requested',
          entityType: EXPORT_ENTITY,
          entityId: id,
          after: {
            kind: values.kind,
            table: values.tableName,
            format: values.format,
            params: values.params as Record<string, unknown>,
          },
        },
        transaction,
      );
    });
    try {
      await this.queue.write(id);
    } catch (error) {
      this.logger.warn(`could not queue export ${id}: ${(error as Error).message}`);
      await this.exports.update(
        { state: 'failed', error: 'The export could not be queued; please try again shortly.' },
        { where: { id } },
      );
    }
    return this.toView((await this.exports.findByPk(id))!);
  }

  /**
   * A snapshots export copies a dashboard: the person must be able to open that dashboard (its
   * own 403 and 404), and its period must read; a bad period names `filters.<field>`.
   */
  private async checkDashboard(actor: Actor, filters: SnapshotExportParams): Promise<void> {
    if (filters.scope !== 'network' && filters.scopeId === undefined)
      throw invalidField('filters.scopeId', `scopeId is required for a ${filters.scope}.`);
    try {
      await snapshotDashboard(this.dashboards, actor, filters);
    } catch (error) {
      const body = error instanceof BadRequestException ? error.getResponse() : null;
      if (body && typeof body === 'object' && 'fields' in body && Array.isArray(body.fields)) {
        const fields = (body.fields as Array<{ field: string; messages: string[] }>).map((f) => ({
          ...f,
          field: `filters.${f.field}`,
        }));
        throw new BadRequestException({
          message: `Invalid input: ${fields.map((f) => f.field).join(', ')}`,
          fields,
        });
      }
      throw error;
    }
  }

  /**
   * Names of the region and chapter a table's filters pick, for the description; one outside
   * the person's scope is not found (404), as on every other route.
   */
  private async placeNames(actor: Actor, filters: Record<string, unknown>): Promise<string[]> {
    const names: string[] = [];
    const regionId = (filters.regionId ??
      (filters.scope === 'region' ? filters.scopeId : undefined)) as number | undefined;
    const chapterId = (filters.chapterId ??
      (filters.scope === 'chapter' ? filters.scopeId : undefined)) as number | undefined;
    if (regionId !== undefined) names.push(await this.regionName(actor, regionId));
    if (chapterId !== undefined) {
      const chapter = await this.chapters.findOne({
        where: within(chapterScope(actor), { id: chapterId }),
      });
      if (!chapter) throw new NotFoundException('No such chapter.');
      names.push(chapter.name);
    }
    return names;
  }

  private async impactScopeName(
    actor: Actor,
    scope: 'region' | 'campaign',
    id: number,
  ): Promise<string> {
    if (scope === 'region') return this.regionName(actor, id);
    const campaign = await this.campaigns.findByPk(id);
    // A regional campaign is in scope where its region is.
    if (
      !campaign ||
      (campaign.regionId !== null &&
        !(await this.regions.count({
          where: within(regionScope(actor), { id: campaign.regionId }),
        })))
    )
      throw new NotFoundException('No such campaign.');
    return campaign.name;
  }

  /** A region's name; one outside the person's scope is not found, like one that does not exist. */
  private async regionName(actor: Actor, id: number): Promise<string> {
    const region = await this.regions.findOne({ where: within(regionScope(actor), { id }) });
    if (!region) throw new NotFoundException('No such region.');
    return region.name;
  }
}

/** The date or month range a table's filters pick, in words. */
function rangeOf(filters: Record<string, unknown>): string | null {
  const { from, to, month, period } = filters as Partial<Record<string, string>>;
  if (month) return month;
  if (from && to) return `${from} to ${to}`;
  if (from) return `from ${from}`;
  if (to) return `to ${to}`;
  if (period) return period;
  return null;
}

function impactPackParams(
  scope: ImpactPackScope,
  scopeId: number | undefined,
  period: Period,
): ImpactPackRequest {
  const range =
    period.kind === 'custom' ? { from: period.from, to: period.to } : { period: period.key };
  return {
    scope,
    ...(scopeId === undefined ? {} : { scopeId }),
    periodKind: period.kind,
    ...range,
  };
}

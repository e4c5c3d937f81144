import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { can, type FieldProblem } from '@tallyloom/core';
import { col, fn, literal, type Transaction, type WhereOptions } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import { AuditEntry } from '../audit/models/audit-entry.model';
import { BlanketSize } from '../blanket-sizes/models/blanket-size.model';
import { Chapter } from '../chapters/models/chapter.model';
import type { Actor } from '../common/access/actor';
import { chapterScope, within } from '../common/access/scope';
import type { SignedInContext } from '../common/context/request-context';
import { Region } from '../regions/models/region.model';
import type { ReceiptInputDto, UpdateReceiptDto } from './dto/receipt-input.dto';
import type { ListReceiptsQuery } from './dto/list-receipts.query';
import type {
  ReceiptDetailDto,
  ReceiptDto,
  ReceiptHistoryEntryDto,
  ReceiptPageDto,
} from './dto/receipt-view.dto';
import { ParcelReceipt } from './models/parcel-receipt.model';
import { ReceiptFinishedBlanket } from './models/receipt-finished-blanket.model';
import { ReceiptScan } from './models/receipt-scan.model';
import { ReceiptReferenceData } from './receipt-reference-data';
import { auditableReceipt, toReceiptView, toScanView } from './receipt.mappers';
import { latestToday, receiptProblems, receiptValues, type ResolvedInput } from './receipt-rules';
import { receiptListFilters, receiptListOrder, receiptSortKeys } from './receipt-list-query';
import { SCOPE_CHAPTER, receiptScope } from './receipt-scope';
import { StaleReceiptException } from './stale-receipt.exception';

export const RECEIPT_ENTITY = 'parcel_receipt';

const WITH_CHAPTER_AND_REGION = {
  model: Chapter,
  attributes: ['id', 'name', 'regionId'],
  required: true,
  include: [{ model: Region, attributes: ['id', 'name'] }],
};

function problems(list: FieldProblem[]): BadRequestException {
  return new BadRequestException({
    message: `Invalid input: ${[...new Set(list.map((p) => p.field))].join(', ')}`,
    fields: list,
  });
}

const notFound = () => new NotFoundException('No such parcel receipt.');

@Injectable()
export class ReceiptsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(ParcelReceipt) private readonly receipts: typeof ParcelReceipt,
    @InjectModel(ReceiptFinishedBlanket)
    private readonly finishedBlankets: typeof ReceiptFinishedBlanket,
    @InjectModel(ReceiptScan) private readonly scans: typeof ReceiptScan,
    @InjectModel(Chapter) private readonly chapters: typeof Chapter,
    @InjectModel(AuditEntry) private readonly auditEntries: typeof AuditEntry,
    private readonly reference: ReceiptReferenceData,
    private readonly audit: AuditService,
  ) {}

  async list(actor: Actor, query: ListReceiptsQuery): Promise<ReceiptPageDto> {
    const page = query.page ?? 1;
    const pageSize = query.pageSize ?? 25;
    const where = within(receiptScope(actor), receiptListFilters(query));
    const order = receiptListOrder(receiptSortKeys(query));
    const [rows, totals] = await Promise.all([
      this.receipts.findAll({
        where,
        include: [WITH_CHAPTER_AND_REGION],
        order,
        limit: pageSize,
        offset: (page - 1) * pageSize,
      }),
      this.totals(where),
    ]);
    return {
      items: await this.views(actor, rows),
      total: totals.receipts,
      page,
      pageSize,
      totals,
    };
  }

  async get(actor: Actor, id: number): Promise<ReceiptDetailDto> {
    const receipt = await this.receipts.findOne({
      where: within(receiptScope(actor), { id }),
      include: [WITH_CHAPTER_AND_REGION],
    });
    if (!receipt) throw notFound();
    const [view] = await this.views(actor, [receipt]);
    const scans = await this.scans.findAll({ where: { receiptId: id }, order: [['id', 'ASC']] });
    return { ...view, scans: scans.map(toScanView) };
  }

  async create(context: SignedInContext, body: ReceiptInputDto): Promise<ReceiptDetailDto> {
    const { values, finishedBlankets } = await this.resolve(context.actor, body, null);
    const id = await this.sequelize.transaction(async (transaction) => {
      const receipt = await this.receipts.create(
        { ...values, createdBy: context.actor.id, version: 1 },
        { transaction },
      );
      await this.saveFinishedBlankets(receipt.id, finishedBlankets, transaction);
      await this.audit.record(
        context,
        {
          action: 'receipt.created',
          entityType: RECEIPT_ENTITY,
          entityId: receipt.id,
          after: auditableReceipt(receipt, finishedBlankets),
        },
        transaction,
      );
      return receipt.id;
    });
    return this.get(context.actor, id);
  }

  async update(
    context: SignedInContext,
    id: number,
    body: UpdateReceiptDto,
  ): Promise<ReceiptDetailDto> {
    const existing = await this.findInScope(context.actor, id);
    if (existing.version !== body.version) await this.stale(context.actor, id);
    const { values, finishedBlankets } = await this.resolve(context.actor, body, existing);
    const outcome = await this.sequelize.transaction(async (transaction) => {
      const receipt = await this.receipts.findOne({
        where: { id },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!receipt) return 'gone' as const;
      if (receipt.version !== body.version) return 'stale' as const;
      const before = auditableReceipt(receipt, await this.blanketsOf(id, transaction));
      await receipt.update({ ...values, version: receipt.version + 1 }, { transaction });
      await this.finishedBlankets.destroy({ where: { receiptId: id }, transaction });
      await this.saveFinishedBlankets(id, finishedBlankets, transaction);
      await this.audit.record(
        context,
        {
          action: 'receipt.updated',
          entityType: RECEIPT_ENTITY,
          entityId: id,
          before,
          after: auditableReceipt(receipt, finishedBlankets),
        },
        transaction,
      );
      return 'saved' as const;
    });
    if (outcome === 'gone') throw notFound();
    if (outcome === 'stale') await this.stale(context.actor, id);
    return this.get(context.actor, id);
  }

  /** Clears the sender's personal data for good; every count stays. */
  async eraseSender(context: SignedInContext, id: number): Promise<ReceiptDetailDto> {
    await this.findInScope(context.actor, id);
    await this.sequelize.transaction(async (transaction) => {
      const receipt = await this.receipts.findOne({
        where: { id },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!receipt) throw notFound();
      const erasedFields = (
        [
          ['name', receipt.senderName],
          ['email', receipt.senderEmail],
          ['address', receipt.senderAddress],
        ] as const
      )
        .filter(([, value]) => value !== null)
        .map(([field]) => field);
      await receipt.update(
        {
          senderName: null,
          senderEmail: null,
          senderAddress: null,
          senderErasedAt: receipt.senderErasedAt ?? new Date(),
          senderErasedBy: receipt.senderErasedBy ?? context.actor.id,
          version: receipt.version + 1,
        },
        { transaction },
      );
      // Which fields were erased, never what they held.
      await this.audit.record(
        context,
        {
          action: 'receipt.sender_erased',
          entityType: RECEIPT_ENTITY,
          entityId: id,
          before: { sender: erasedFields.length > 0 ? 'present' : 'absent' },
          after: { sender: 'absent', erasedFields },
        },
        transaction,
      );
    });
    return this.get(context.actor, id);
  }

  async history(actor: Actor, id: number): Promise<ReceiptHistoryEntryDto[]> {
    await this.findInScope(actor, id);
    const entries = await this.auditEntries.findAll({
      where: { entityType: RECEIPT_ENTITY, entityId: String(id) },
      order: [['id', 'ASC']],
    });
    return entries.map((entry) => ({
      id: entry.id,
      action: entry.action,
      occurredAt: entry.occurredAt.toISOString(),
      actorUserId: entry.actorUserId,
      actorEmail: entry.actorEmail,
      before: json(entry.beforeJson),
      after: json(entry.afterJson),
    }));
  }

  async findInScope(actor: Actor, id: number): Promise<ParcelReceipt> {
    const receipt = await this.receipts.findOne({
      where: within(receiptScope(actor), { id }),
      include: [SCOPE_CHAPTER],
    });
    if (!receipt) throw notFound();
    return receipt;
  }

  private async stale(actor: Actor, id: number): Promise<never> {
    throw new StaleReceiptException(await this.get(actor, id));
  }

  /** Every rule that needs the database; all problems at once, each named by its field. */
  private async resolve(
    actor: Actor,
    body: ReceiptInputDto,
    existing: ParcelReceipt | null,
  ): Promise<ResolvedInput> {
    const chapter = await this.chapters.findOne({
      where: within(chapterScope(actor), { id: body.chapterId }),
    });
    if (!chapter) {
      if (await this.chapters.findByPk(body.chapterId, { attributes: ['id'] }))
        throw new NotFoundException('No such chapter.');
      throw problems([{ field: 'chapterId', messages: ['No such chapter.'] }]);
    }
    const settings = await this.reference.settings();
    const sizes = await this.reference.blanketSizes([
      ...new Set(body.finishedBlankets.map((r) => r.blanketSizeId)),
    ]);
    const found = receiptProblems(body, {
      chapter,
      ceiling: settings.receiptCountCeiling,
      sizes: new Map(sizes.map((size) => [size.id, size])),
      senderErased: Boolean(existing?.senderErasedAt),
      today: latestToday(),
    });
    if (found.length > 0) throw problems(found);

    const code = body.campaignCode ?? null;
    const campaign = code
      ? await this.reference.findCreditableCampaign(code, body.receivedOn, chapter.regionId)
      : null;
    // On a correction, an absent `sender` leaves the stored details as they are.
    return receiptValues(body, chapter.id, campaign?.id ?? null, {
      keepStoredSender: existing !== null && body.sender === undefined,
    });
  }

  private async saveFinishedBlankets(
    receiptId: number,
    rows: Array<{ blanketSizeId: number; count: number }>,
    transaction: Transaction,
  ): Promise<void> {
    if (rows.length === 0) return;
    await this.finishedBlankets.bulkCreate(
      rows.map((row) => ({ ...row, receiptId })),
      { transaction },
    );
  }

  private async blanketsOf(receiptId: number, transaction?: Transaction) {
    const rows = await this.finishedBlankets.findAll({ where: { receiptId }, transaction });
    return rows.map(({ blanketSizeId, count }) => ({ blanketSizeId, count }));
  }

  /** Views of loaded receipts, with their finished blankets and scan counts in two queries. */
  private async views(actor: Actor, receipts: ParcelReceipt[]): Promise<ReceiptDto[]> {
    if (receipts.length === 0) return [];
    const ids = receipts.map((r) => r.id);
    const [blankets, scanCounts, settings] = await Promise.all([
      this.finishedBlankets.findAll({
        where: { receiptId: ids },
        include: [{ model: BlanketSize, attributes: ['id', 'name', 'sortOrder'] }],
        order: [
          [{ model: BlanketSize, as: 'blanketSize' }, 'sortOrder', 'ASC'],
          ['blanketSizeId', 'ASC'],
        ],
      }),
      this.scans.findAll({
        attributes: ['receiptId', [fn('COUNT', col('id')), 'count']],
        where: { receiptId: ids },
        group: ['receiptId'],
        raw: true,
      }) as unknown as Promise<Array<{ receiptId: number; count: number | string }>>,
      this.reference.settings(),
    ]);
    const showSender = can(actor.role, 'senders.read');
    return receipts.map((receipt) =>
      toReceiptView(receipt, {
        showSender,
        toleranceIn: settings.panelToleranceIn,
        finishedBlankets: blankets.filter((row) => row.receiptId === receipt.id),
        scanCount: Number(scanCounts.find((row) => row.receiptId === receipt.id)?.count ?? 0),
      }),
    );
  }

  /** Sums over every matching receipt, in SQL: the page shows only some of them. */
  private async totals(where: WhereOptions): Promise<ReceiptPageDto['totals']> {
    const row = (await this.receipts.findOne({
      where,
      include: [SCOPE_CHAPTER],
      attributes: [
        [fn('COUNT', col('ParcelReceipt.id')), 'receipts'],
        [fn('COALESCE', fn('SUM', col('panels_accepted')), 0), 'panelsAccepted'],
        [
          literal(
            'COALESCE(SUM(set_aside_off_size + set_aside_hard_care + set_aside_soiled + set_aside_other), 0)',
          ),
          'setAside',
        ],
        [
          literal(
            'COALESCE(SUM((SELECT SUM(fb.count) FROM receipt_finished_blankets fb WHERE fb.receipt_id = `ParcelReceipt`.`id`)), 0)',
          ),
          'finishedBlankets',
        ],
        [fn('COALESCE', fn('SUM', col('other_items')), 0), 'otherItems'],
      ],
      raw: true,
    })) as unknown as Record<keyof ReceiptPageDto['totals'], string | number> | null;
    return {
      receipts: Number(row?.receipts ?? 0),
      panelsAccepted: Number(row?.panelsAccepted ?? 0),
      setAside: Number(row?.setAside ?? 0),
      finishedBlankets: Number(row?.finishedBlankets ?? 0),
      otherItems: Number(row?.otherItems ?? 0),
    };
  }
}

/** JSON columns may come back parsed or as text, depending on the driver. */
function json(value: unknown): Record<string, unknown> | null {
  if (value === null || value === undefined) return null;
  return (typeof value === 'string' ? JSON.parse(value) : value) as Record<string, unknown>;
}

import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import {
  addMonths,
  headlineCountsOf,
  monthEnd,
  monthStart,
  panelsPerBlanket,
  type MonthKey,
  type TallyCheckContext,
  type TallyValues,
} from '@tallyloom/core';
import { Op, QueryTypes, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { BlanketSize } from '../blanket-sizes/models/blanket-size.model';
import { SettingsService } from '../settings/settings.service';
import { MonthlyTally } from './models/monthly-tally.model';
import { TallyRevisionsRepository } from './tally-revisions.repository';

/** How many approved months the plausibility check compares with. */
const HISTORY_MONTHS = 12;

export type ReceiptSums = TallyCheckContext['receipts'];
export type ExpectedOpening = NonNullable<TallyCheckContext['expectedOpening']>;

/** 'YYYY-MM-01' as stored → 'YYYY-MM'. */
export const monthKeyOf = (stored: string): MonthKey => stored.slice(0, 7);

/**
 * Everything the checks need besides the values, read from the database: the month's receipts,
 * the catalogue, last month's closing stock, the chapter's approved history and the setting.
 */
@Injectable()
export class TallyCheckContextBuilder {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(MonthlyTally) private readonly tallies: typeof MonthlyTally,
    @InjectModel(BlanketSize) private readonly sizes: typeof BlanketSize,
    private readonly revisions: TallyRevisionsRepository,
    private readonly settings: SettingsService,
  ) {}

  /**
   * Inside a write, pass its transaction and the setting read beforehand: a write holding one
   * pooled connection must not wait for more.
   */
  async build(
    tally: Pick<MonthlyTally, 'chapterId' | 'month'>,
    values: TallyValues,
    options: { transaction?: Transaction; servedPerBlanketWarnFactor?: number } = {},
  ): Promise<TallyCheckContext> {
    const { transaction } = options;
    const month = monthKeyOf(tally.month);
    const sizeIds = [
      ...values.blankets.assembled.map((line) => line.blanketSizeId),
      ...values.blankets.given.map((line) => line.blanketSizeId),
    ];
    const [receipts, blanketSizes, expectedOpening, history, factor] = await Promise.all([
      this.receiptSums(tally.chapterId, month, transaction),
      this.catalogue(sizeIds, transaction),
      this.expectedOpening(tally.chapterId, month, transaction),
      this.history(tally.chapterId, month, transaction),
      options.servedPerBlanketWarnFactor ?? this.servedPerBlanketWarnFactor(),
    ]);
    return {
      month,
      receipts,
      blanketSizes,
      expectedOpening,
      history,
      servedPerBlanketWarnFactor: factor,
    };
  }

  async servedPerBlanketWarnFactor(): Promise<number> {
    return (await this.settings.current()).servedPerBlanketWarnFactor;
  }

  /** Sums of the chapter-month's parcel receipts, in SQL. */
  async receiptSums(
    chapterId: number,
    month: MonthKey,
    transaction?: Transaction,
  ): Promise<ReceiptSums> {
    const replacements = { chapterId, from: monthStart(month), to: monthEnd(month) };
    const inMonth = 'chapter_id = :chapterId AND received_on BETWEEN :from AND :to';
    const [row] = await this.sequelize.query<Record<string, string | number | null>>(
      `SELECT COUNT(*) AS receipts,
              COALESCE(SUM(panels_accepted), 0) AS panelsAccepted,
              COALESCE(SUM(set_aside_off_size), 0) AS offSize,
              COALESCE(SUM(set_aside_hard_care), 0) AS hardCareYarn,
              COALESCE(SUM(set_aside_soiled), 0) AS soiledOrDamaged,
              COALESCE(SUM(set_aside_other), 0) AS other,
              (SELECT COALESCE(SUM(fb.count), 0)
                 FROM receipt_finished_blankets fb
                 JOIN parcel_receipts r ON r.id = fb.receipt_id
                WHERE r.${inMonth}) AS finishedBlankets
         FROM parcel_receipts
        WHERE ${inMonth}`,
      { replacements, type: QueryTypes.SELECT, transaction },
    );
    const n = (key: string) => Number(row?.[key] ?? 0);
    return {
      count: n('receipts'),
      panelsAccepted: n('panelsAccepted'),
      setAside: {
        offSize: n('offSize'),
        hardCareYarn: n('hardCareYarn'),
        soiledOrDamaged: n('soiledOrDamaged'),
        other: n('other'),
      },
      finishedBlankets: n('finishedBlankets'),
    };
  }

  /** The sizes in use, and any retired size the values still name, in catalogue order. */
  async catalogue(
    sizeIds: number[],
    transaction?: Transaction,
  ): Promise<TallyCheckContext['blanketSizes']> {
    const rows = await this.sizes.findAll({
      where: { [Op.or]: [{ active: true }, ...(sizeIds.length ? [{ id: sizeIds }] : [])] },
      order: [
        ['sortOrder', 'ASC'],
        ['id', 'ASC'],
      ],
      transaction,
    });
    return rows.map((size) => ({ id: size.id, name: size.name, panels: panelsPerBlanket(size) }));
  }

  /**
   * Last month's closing stock: its approved revision's when it has one, else the revision being
   * worked on. Null when the chapter has no tally for last month.
   */
  async expectedOpening(
    chapterId: number,
    month: MonthKey,
    transaction?: Transaction,
  ): Promise<ExpectedOpening | null> {
    const fromMonth = addMonths(month, -1);
    const previous = await this.tallies.findOne({
      where: { chapterId, month: monthStart(fromMonth) },
      transaction,
    });
    if (!previous) return null;
    const approved = previous.approvedRevision !== null;
    const revision = await this.revisions.find(
      previous.id,
      previous.approvedRevision ?? previous.currentRevision,
      transaction,
    );
    if (!revision) return null;
    return {
      panels: revision.panelsClosing,
      blankets: revision.blanketsClosing,
      fromMonth,
      approved,
    };
  }

  /** Headline counts of the chapter's last approved months before `month`, oldest first. */
  async history(
    chapterId: number,
    month: MonthKey,
    transaction?: Transaction,
  ): Promise<TallyCheckContext['history']> {
    const tallies = await this.tallies.findAll({
      where: {
        chapterId,
        month: { [Op.lt]: monthStart(month) },
        approvedRevision: { [Op.ne]: null },
      },
      order: [['month', 'DESC']],
      limit: HISTORY_MONTHS,
      transaction,
    });
    const revisions = await this.revisions.findMany(
      tallies.map((tally) => ({ tallyId: tally.id, revision: tally.approvedRevision! })),
      transaction,
    );
    const values = await this.revisions.valuesOf(revisions, transaction);
    return tallies
      .map((tally) => {
        const revision = revisions.find(
          (r) => r.tallyId === tally.id && r.revision === tally.approvedRevision,
        );
        const counts = revision ? values.get(revision.id) : undefined;
        return counts ? { month: monthKeyOf(tally.month), ...headlineCountsOf(counts) } : null;
      })
      .filter((entry) => entry !== null)
      .reverse();
  }
}

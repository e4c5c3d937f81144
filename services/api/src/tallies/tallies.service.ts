import {
  BadRequestException,
  ConflictException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import {
  addMonths,
  diffTallyValues,
  emptyTallyValues,
  monthLabel,
  monthOf,
  monthStart,
  type FieldProblem,
  type MonthKey,
  type TallyDetail,
  type TallyValues,
} from '@tallyloom/core';
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AgencyChapter } from '../agencies/models/agency-chapter.model';
import { AuditService } from '../audit/audit.service';
import { BlanketSize } from '../blanket-sizes/models/blanket-size.model';
import { Chapter } from '../chapters/models/chapter.model';
import type { Actor } from '../common/access/actor';
import { chapterScope, within } from '../common/access/scope';
import type { SignedInContext } from '../common/context/request-context';
import { invalidField } from '../common/validation/field-errors';
import type { CreateTallyDto, SaveTallyDto } from './dto/tally-requests.dto';
import { MonthlyTally } from './models/monthly-tally.model';
import { TallyEvent } from './models/tally-event.model';
import { TallyCheckContextBuilder, monthKeyOf, type ExpectedOpening } from './tally-check-context';
import { latestMonth } from './tally-clock';
import { TALLY_WRITE, TallyLock } from './tally-lock';
import { TallyReader } from './tally-reader.service';
import { TallyRevisionsRepository } from './tally-revisions.repository';
import { saveRuleProblems } from './tally-save-rules';
import { normalizedValues } from './tally-values';

export const TALLY_ENTITY = 'monthly_tally';

function problems(list: FieldProblem[]): BadRequestException {
  return new BadRequestException({
    message: `Invalid input: ${[...new Set(list.map((p) => p.field))].join(', ')}`,
    fields: list,
  });
}

/** Starting a chapter-month's tally and saving its figures while it is a draft. */
@Injectable()
export class TalliesService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(MonthlyTally) private readonly tallies: typeof MonthlyTally,
    @InjectModel(TallyEvent) private readonly events: typeof TallyEvent,
    @InjectModel(Chapter) private readonly chapters: typeof Chapter,
    @InjectModel(BlanketSize) private readonly sizes: typeof BlanketSize,
    @InjectModel(AgencyChapter) private readonly agencyLinks: typeof AgencyChapter,
    private readonly revisions: TallyRevisionsRepository,
    private readonly checkContext: TallyCheckContextBuilder,
    private readonly lock: TallyLock,
    private readonly reader: TallyReader,
    private readonly audit: AuditService,
  ) {}

  /**
   * Revision 1 of a new tally, prefilled: panels accepted and set aside and finished blankets
   * received from the month's receipts; opening stock from last month's closing stock, or typed
   * in for a chapter's first tally.
   */
  async create(context: SignedInContext, body: CreateTallyDto): Promise<TallyDetail> {
    const chapter = await this.chapterInScope(context.actor, body.chapterId);
    const month = body.month;
    refuseMonthOutsideChapter(chapter, month);
    let id: number;
    try {
      id = await this.sequelize.transaction(TALLY_WRITE, async (transaction) => {
        await this.refuseExisting(chapter, month, transaction);
        const opening = await this.openingFor(chapter, month, body, transaction);
        const receipts = await this.checkContext.receiptSums(chapter.id, month, transaction);
        const values = prefilledValues(opening.stock, receipts);
        const tally = await this.tallies.create(
          {
            chapterId: chapter.id,
            month: monthStart(month),
            state: 'draft',
            currentRevision: 1,
            approvedRevision: null,
            openingEnteredByHand: opening.byHand,
            version: 1,
            createdBy: context.actor.id,
          },
          { transaction },
        );
        await this.revisions.create(
          { tallyId: tally.id, revision: 1, createdBy: context.actor.id },
          values,
          transaction,
        );
        await this.events.create(
          { tallyId: tally.id, revision: 1, kind: 'created', actorId: context.actor.id },
          { transaction },
        );
        await this.audit.record(
          context,
          {
            action: 'tally.created',
            entityType: TALLY_ENTITY,
            entityId: tally.id,
            after: {
              chapterId: chapter.id,
              month,
              openingEnteredByHand: opening.byHand,
              openingFrom: opening.from,
              values,
            },
          },
          transaction,
        );
        return tally.id;
      });
    } catch (error) {
      // Two requests raced past the check: the unique index decided, so answer as the check does.
      if (error instanceof UniqueConstraintError)
        await this.refuseExisting(chapter, month, undefined);
      throw error;
    }
    return this.reader.detail(context.actor, id);
  }

  /**
   * Autosave of a draft or returned tally: every figure replaced, checks not required (a draft may
   * be inconsistent; submitting is where they must pass). Saving the same figures changes nothing.
   */
  async save(context: SignedInContext, id: number, body: SaveTallyDto): Promise<TallyDetail> {
    await this.lock.write(context, id, {
      version: body.version,
      action: 'edit',
      apply: async ({ tally, current, transaction }) => {
        const before = await this.revisions.valueOf(current, transaction);
        const found = await this.saveProblems(tally, before, body.values, transaction);
        if (found.length > 0) throw problems(found);
        const after = normalizedValues(body.values);
        const changes = diffTallyValues(before, after);
        if (changes.length === 0) return null;
        await this.revisions.replaceValues(current, after, transaction);
        await this.audit.recordChange(
          context,
          {
            action: 'tally.saved',
            entityType: TALLY_ENTITY,
            entityId: id,
            before: {
              revision: current.revision,
              ...Object.fromEntries(changes.map((change) => [change.field, change.before])),
            },
            after: {
              revision: current.revision,
              ...Object.fromEntries(changes.map((change) => [change.field, change.after])),
            },
          },
          transaction,
        );
        return {};
      },
    });
    return this.reader.detail(context.actor, id);
  }

  private async chapterInScope(actor: Actor, chapterId: number): Promise<Chapter> {
    const chapter = await this.chapters.findOne({
      where: within(chapterScope(actor), { id: chapterId }),
    });
    if (chapter) return chapter;
    if (await this.chapters.findByPk(chapterId, { attributes: ['id'] }))
      throw new NotFoundException('No such chapter.');
    throw invalidField('chapterId', 'No such chapter.');
  }

  /** 409 naming the tally that already holds this chapter-month. */
  private async refuseExisting(
    chapter: Chapter,
    month: MonthKey,
    transaction: Transaction | undefined,
  ): Promise<void> {
    const existing = await this.tallies.findOne({
      where: { chapterId: chapter.id, month: monthStart(month) },
      attributes: ['id'],
      transaction,
    });
    if (!existing) return;
    const message = `${chapter.name} already has a tally for ${monthLabel(month)} (tally ${existing.id}); open it instead of starting another.`;
    throw new ConflictException({
      message,
      fields: [{ field: 'month', messages: [message] }],
    });
  }

  /**
   * Last month's closing stock when the chapter has a tally for it. A chapter with no earlier
   * tally types its opening in; one with earlier tallies but none for last month has a gap.
   */
  private async openingFor(
    chapter: Chapter,
    month: MonthKey,
    body: CreateTallyDto,
    transaction: Transaction,
  ): Promise<{
    stock: { panels: number; blankets: number };
    byHand: boolean;
    from: ExpectedOpening | null;
  }> {
    const expected = await this.checkContext.expectedOpening(chapter.id, month, transaction);
    if (expected) {
      if (body.opening !== undefined && body.opening !== null)
        throw invalidField(
          'opening',
          `Opening stock is carried from the closing stock of ${monthLabel(expected.fromMonth)}; leave opening out.`,
        );
      return {
        stock: { panels: expected.panels, blankets: expected.blankets },
        byHand: false,
        from: expected,
      };
    }
    const earlier = await this.tallies.findOne({
      where: { chapterId: chapter.id, month: { [Op.lt]: monthStart(month) } },
      order: [['month', 'DESC']],
      attributes: ['id', 'month'],
      transaction,
    });
    if (earlier) {
      const previous = monthLabel(addMonths(month, -1));
      const message = `File the tally for ${previous} first: ${chapter.name}'s last tally is for ${monthLabel(monthKeyOf(earlier.month))}, and each month's opening stock is the month before's closing stock.`;
      throw new ConflictException({ message, fields: [{ field: 'month', messages: [message] }] });
    }
    return {
      stock: { panels: body.opening?.panels ?? 0, blankets: body.opening?.blankets ?? 0 },
      byHand: true,
      from: null,
    };
  }

  /** Every rule of the sent figures that needs the database, all problems at once. */
  private async saveProblems(
    tally: MonthlyTally,
    before: TallyValues,
    values: TallyValues,
    transaction: Transaction,
  ): Promise<FieldProblem[]> {
    const sizeIds = [
      ...new Set([
        ...values.blankets.assembled.map((line) => line.blanketSizeId),
        ...values.blankets.given.map((line) => line.blanketSizeId),
      ]),
    ];
    const [sizes, links, chapter, expected] = await Promise.all([
      sizeIds.length
        ? this.sizes.findAll({ where: { id: sizeIds }, attributes: ['id'], transaction })
        : [],
      this.agencyLinks.findAll({ where: { chapterId: tally.chapterId }, transaction }),
      this.chapters.findByPk(tally.chapterId, { attributes: ['id', 'name'], transaction }),
      tally.openingEnteredByHand
        ? null
        : this.checkContext.expectedOpening(tally.chapterId, monthKeyOf(tally.month), transaction),
    ]);
    const stored = { panels: before.panels.opening, blankets: before.blankets.opening };
    return saveRuleProblems(values, {
      knownSizeIds: new Set(sizes.map((size) => size.id)),
      agencyIds: new Set(links.map((link) => link.agencyId)),
      chapterName: chapter?.name ?? 'this chapter',
      carriedOpenings: tally.openingEnteredByHand ? null : expected ? [stored, expected] : [stored],
    });
  }
}

/** Refuses a month before the chapter started, after it closed, or in the future. */
function refuseMonthOutsideChapter(chapter: Chapter, month: MonthKey): void {
  const started = monthOf(chapter.activeFrom);
  if (month < started)
    throw invalidField(
      'month',
      `${monthLabel(month)} is before ${chapter.name} started (${monthLabel(started)}); there is nothing to report for it.`,
    );
  if (month > latestMonth())
    throw invalidField(
      'month',
      `${monthLabel(month)} is in the future; a month's tally can be started once the month has begun.`,
    );
  if (chapter.activeTo && month > monthOf(chapter.activeTo))
    throw invalidField(
      'month',
      `${monthLabel(month)} is after ${chapter.name} closed (${monthLabel(monthOf(chapter.activeTo))}).`,
    );
}

/** A new tally: the receipts' sums and the opening stock, closing stock following from them. */
function prefilledValues(
  opening: { panels: number; blankets: number },
  receipts: Awaited<ReturnType<TallyCheckContextBuilder['receiptSums']>>,
): TallyValues {
  const values = emptyTallyValues();
  values.panels.opening = opening.panels;
  values.panels.accepted = receipts.panelsAccepted;
  values.panels.setAside = { ...receipts.setAside };
  values.panels.closing = opening.panels + receipts.panelsAccepted;
  values.blankets.opening = opening.blankets;
  values.blankets.received = receipts.finishedBlankets;
  values.blankets.closing = opening.blankets + receipts.finishedBlankets;
  return values;
}

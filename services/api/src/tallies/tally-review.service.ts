import { ForbiddenException, Injectable, UnprocessableEntityException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import {
  checkTally,
  submissionProblems,
  type TallyDetail,
  type TallyEventKind,
} from '@tallyloom/core';
import type { Transaction } from 'sequelize';
import { AuditService } from '../audit/audit.service';
import type { ChapterMonthJob } from '../reports/report-jobs';
import { SnapshotQueue } from '../reports/snapshot-queue.service';
import type { SignedInContext } from '../common/context/request-context';
import { invalidField } from '../common/validation/field-errors';
import type {
  AmendTallyDto,
  ApproveTallyDto,
  ReturnTallyDto,
  SubmitTallyDto,
} from './dto/tally-requests.dto';
import { TallyEvent } from './models/tally-event.model';
import { TallyRevision } from './models/tally-revision.model';
import { TALLY_ENTITY } from './tallies.service';
import { OWN_APPROVAL } from './tally-access';
import { TallyCheckContextBuilder } from './tally-check-context';
import { TallyLock } from './tally-lock';
import { TallyReader } from './tally-reader.service';
import { TallyRevisionsRepository } from './tally-revisions.repository';

const IDEMPOTENCY_KEY = /^[\x21-\x7e]{1,128}$/;

/** The review flow: submit, approve, return, and amend an approved tally. */
@Injectable()
export class TallyReviewService {
  constructor(
    @InjectModel(TallyEvent) private readonly events: typeof TallyEvent,
    @InjectModel(TallyRevision) private readonly revisionRows: typeof TallyRevision,
    private readonly revisions: TallyRevisionsRepository,
    private readonly checkContext: TallyCheckContextBuilder,
    private readonly lock: TallyLock,
    private readonly reader: TallyReader,
    private readonly audit: AuditService,
    private readonly snapshots: SnapshotQueue,
  ) {}

  /**
   * Runs every check on the stored figures: errors and unacknowledged warnings refuse (422, each
   * problem by field). With an idempotency key, a repeat of a submission already made answers as
   * the first did and changes nothing.
   */
  async submit(
    context: SignedInContext,
    id: number,
    body: SubmitTallyDto,
    idempotencyKey: string | undefined,
  ): Promise<TallyDetail> {
    if (idempotencyKey !== undefined && !IDEMPOTENCY_KEY.test(idempotencyKey))
      throw invalidField(
        'Idempotency-Key',
        'The Idempotency-Key header must be 1 to 128 visible characters without spaces.',
      );
    const acknowledgedWarnings = [...new Set(body.acknowledgedWarnings)];
    const acknowledgementNote = body.acknowledgementNote ?? null;
    const servedPerBlanketWarnFactor = await this.checkContext.servedPerBlanketWarnFactor();
    let submitted: ChapterMonthJob | null = null;
    await this.lock.write(context, id, {
      version: body.version,
      action: 'submit',
      isRepeat: async ({ tally, transaction }) =>
        idempotencyKey !== undefined &&
        (await this.revisionRows.count({
          where: { tallyId: tally.id, submissionKey: idempotencyKey },
          transaction,
        })) > 0,
      apply: async ({ tally, current, transaction }) => {
        const values = await this.revisions.valueOf(current, transaction);
        const checkContext = await this.checkContext.build(tally, values, {
          transaction,
          servedPerBlanketWarnFactor,
        });
        const checks = checkTally(values, checkContext);
        const found = submissionProblems(checks, { acknowledgedWarnings, acknowledgementNote });
        if (found.length > 0)
          throw new UnprocessableEntityException({
            message: `The tally cannot be submitted yet: ${found.length === 1 ? 'one problem' : `${found.length} problems`} to resolve.`,
            fields: found.map((problem) => ({ field: problem.field, messages: [problem.message] })),
          });
        const now = new Date();
        submitted = chapterMonthOf(tally);
        await current.update(
          {
            state: 'submitted',
            submittedAt: now,
            submittedBy: context.actor.id,
            acknowledgedWarnings,
            acknowledgementNote,
            submissionKey: idempotencyKey ?? null,
          },
          { transaction },
        );
        await this.event(
          context,
          tally.id,
          current.revision,
          'submitted',
          acknowledgementNote,
          transaction,
        );
        await this.audit.record(
          context,
          {
            action: 'tally.submitted',
            entityType: TALLY_ENTITY,
            entityId: id,
            before: { state: tally.state, revision: current.revision },
            after: {
              state: 'submitted',
              revision: current.revision,
              acknowledgedWarnings,
              acknowledgementNote,
            },
          },
          transaction,
        );
        return { state: 'submitted', firstSubmittedAt: tally.firstSubmittedAt ?? now };
      },
    });
    // Pending counts and compliance change with a submission, after it has committed.
    if (submitted) this.snapshots.afterTallyChange(submitted);
    return this.reader.detail(context.actor, id);
  }

  /**
   * Approves the submitted revision: it becomes the one reports read, and an earlier approved
   * revision is superseded. Nobody approves their own submission.
   */
  async approve(context: SignedInContext, id: number, body: ApproveTallyDto): Promise<TallyDetail> {
    const comment = body.comment ?? null;
    let approved: ChapterMonthJob | null = null;
    await this.lock.write(context, id, {
      version: body.version,
      action: 'approve',
      apply: async ({ tally, current, transaction }) => {
        if (current.submittedBy === context.actor.id) throw new ForbiddenException(OWN_APPROVAL);
        approved = chapterMonthOf(tally);
        const superseded = tally.approvedRevision;
        if (superseded !== null && superseded !== current.revision) {
          await this.revisionRows.update(
            { state: 'superseded' },
            { where: { tallyId: tally.id, revision: superseded }, transaction },
          );
        }
        await current.update(
          { state: 'approved', approvedAt: new Date(), approvedBy: context.actor.id },
          { transaction },
        );
        await this.event(context, tally.id, current.revision, 'approved', comment, transaction);
        await this.audit.record(
          context,
          {
            action: 'tally.approved',
            entityType: TALLY_ENTITY,
            entityId: id,
            before: { state: tally.state, approvedRevision: superseded },
            after: {
              state: 'approved',
              approvedRevision: current.revision,
              supersededRevision: superseded,
              comment,
            },
          },
          transaction,
        );
        return { state: 'approved', approvedRevision: current.revision };
      },
    });
    // Only now has the approval committed, so the rebuild reads it.
    if (approved) this.snapshots.afterTallyChange(approved);
    return this.reader.detail(context.actor, id);
  }

  /** Sends a submitted tally back to the chapter with a comment saying what to fix. */
  async return(context: SignedInContext, id: number, body: ReturnTallyDto): Promise<TallyDetail> {
    let returned: ChapterMonthJob | null = null;
    await this.lock.write(context, id, {
      version: body.version,
      action: 'return',
      apply: async ({ tally, current, transaction }) => {
        returned = chapterMonthOf(tally);
        await current.update({ state: 'returned' }, { transaction });
        await this.event(
          context,
          tally.id,
          current.revision,
          'returned',
          body.comment,
          transaction,
        );
        await this.audit.record(
          context,
          {
            action: 'tally.returned',
            entityType: TALLY_ENTITY,
            entityId: id,
            before: { state: tally.state, revision: current.revision },
            after: { state: 'returned', revision: current.revision, comment: body.comment },
          },
          transaction,
        );
        return { state: 'returned' };
      },
    });
    // A returned tally is no longer pending.
    if (returned) this.snapshots.afterTallyChange(returned);
    return this.reader.detail(context.actor, id);
  }

  /**
   * Opens an amendment of an approved tally: a new draft revision with the approved figures and a
   * reason. Reports keep reading the approved revision until the amendment is approved.
   */
  async amend(context: SignedInContext, id: number, body: AmendTallyDto): Promise<TallyDetail> {
    let amended: ChapterMonthJob | null = null;
    await this.lock.write(context, id, {
      version: body.version,
      action: 'amend',
      apply: async ({ tally, current, transaction }) => {
        amended = chapterMonthOf(tally);
        const values = await this.revisions.valueOf(current, transaction);
        const next = current.revision + 1;
        await this.revisions.create(
          {
            tallyId: tally.id,
            revision: next,
            createdBy: context.actor.id,
            amendmentReason: body.reason,
          },
          values,
          transaction,
        );
        await this.event(context, tally.id, next, 'amendment_started', body.reason, transaction);
        await this.audit.record(
          context,
          {
            action: 'tally.amendment_started',
            entityType: TALLY_ENTITY,
            entityId: id,
            before: { state: tally.state, revision: current.revision },
            after: { state: 'draft', revision: next, amendmentReason: body.reason },
          },
          transaction,
        );
        return { state: 'draft', currentRevision: next };
      },
    });
    // The tally is pending again (its approved revision still counts): its month says so.
    if (amended) this.snapshots.afterTallyChange(amended);
    return this.reader.detail(context.actor, id);
  }

  private async event(
    context: SignedInContext,
    tallyId: number,
    revision: number,
    kind: TallyEventKind,
    comment: string | null,
    transaction: Transaction,
  ): Promise<void> {
    await this.events.create(
      { tallyId, revision, kind, comment, actorId: context.actor.id },
      { transaction },
    );
  }
}

/** The chapter-month whose snapshots a change of this tally touches. */
function chapterMonthOf(tally: { chapterId: number; month: string }): ChapterMonthJob {
  return { chapterId: tally.chapterId, month: tally.month.slice(0, 7) };
}

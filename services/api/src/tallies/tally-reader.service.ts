import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import {
  addMonths,
  checkTally,
  monthEnd,
  monthOf,
  monthStart,
  monthsBetween,
  reportingStatus,
  tallyDueOn,
  type MonthKey,
  type TallyCalendar,
  type TallyCalendarEntry,
  type TallyDetail,
  type TallyPage,
  type TallyRevisionView,
  type TallySummary,
} from '@tallyloom/core';
import { Op } from 'sequelize';
import { PartnerAgency } from '../agencies/models/partner-agency.model';
import { Chapter } from '../chapters/models/chapter.model';
import type { Actor } from '../common/access/actor';
import { chapterScope, within } from '../common/access/scope';
import { User } from '../users/models/user.model';
import type { ListTalliesQuery } from './dto/list-tallies.query';
import { MonthlyTally } from './models/monthly-tally.model';
import { TallyEvent } from './models/tally-event.model';
import { allowedActions } from './tally-access';
import { TallyCheckContextBuilder, monthKeyOf } from './tally-check-context';
import { todayUtc } from './tally-clock';
import { tallyNotFound } from './tally-in-scope.guard';
import {
  acknowledgedWarningsOf,
  isAmendmentPending,
  toEventView,
  toRevisionSummary,
  toTallySummary,
  type Names,
} from './tally.mappers';
import { TallyRevisionsRepository } from './tally-revisions.repository';
import { tallyScope } from './tally-scope';
import {
  TALLY_LIST_INCLUDE,
  tallyListFilters,
  tallyListOrder,
  tallySortKeys,
} from './tally-list-query';

/** How far back a chapter lead's home looks for months to file. */
const CALENDAR_MONTHS_BACK = 12;

/** Reads tallies as the person may see them: lists, the full detail, revisions, the calendar. */
@Injectable()
export class TallyReader {
  constructor(
    @InjectModel(MonthlyTally) private readonly tallies: typeof MonthlyTally,
    @InjectModel(TallyEvent) private readonly events: typeof TallyEvent,
    @InjectModel(Chapter) private readonly chapters: typeof Chapter,
    @InjectModel(PartnerAgency) private readonly agencies: typeof PartnerAgency,
    @InjectModel(User) private readonly users: typeof User,
    private readonly revisions: TallyRevisionsRepository,
    private readonly checkContext: TallyCheckContextBuilder,
  ) {}

  async list(actor: Actor, query: ListTalliesQuery): Promise<TallyPage> {
    const page = query.page ?? 1;
    const pageSize = query.pageSize ?? 25;
    const where = within(tallyScope(actor), tallyListFilters(query));
    const { rows, count } = await this.tallies.findAndCountAll({
      where,
      include: [TALLY_LIST_INCLUDE],
      order: tallyListOrder(tallySortKeys(query)),
      limit: pageSize,
      offset: (page - 1) * pageSize,
    });
    return { items: await this.summariesOf(rows), total: count, page, pageSize };
  }

  /**
   * The list's rows as the list shows them (the tallies loaded with TALLY_LIST_INCLUDE): shared
   * with the tallies export, so the file and the screen cannot disagree.
   */
  async summariesOf(rows: MonthlyTally[]): Promise<TallySummary[]> {
    const revisions = await this.revisions.findMany(
      rows.flatMap((tally) => [
        { tallyId: tally.id, revision: tally.currentRevision },
        ...(isAmendmentPending(tally)
          ? [{ tallyId: tally.id, revision: tally.approvedRevision! }]
          : []),
      ]),
    );
    const byKey = new Map(revisions.map((r) => [`${r.tallyId}/${r.revision}`, r]));
    const revisionOf = (tallyId: number, revision: number | null) =>
      byKey.get(`${tallyId}/${revision}`) ?? null;
    const currents = rows.map((tally) => revisionOf(tally.id, tally.currentRevision)!);
    const [values, names] = await Promise.all([
      this.revisions.valuesOf(currents),
      this.namesOf(revisions.map((r) => r.approvedBy)),
    ]);
    const today = todayUtc();
    return rows.map((tally, index) =>
      toTallySummary(tally, {
        current: currents[index],
        approved: revisionOf(tally.id, tally.approvedRevision),
        values: values.get(currents[index].id)!,
        names,
        today,
      }),
    );
  }

  /** The tally with its values, checks as the server runs them, trail and allowed actions. */
  async detail(actor: Actor, id: number): Promise<TallyDetail> {
    const tally = await this.findInScope(actor, id);
    const revisions = await this.revisions.allOf(tally.id);
    const current = revisions.find((r) => r.revision === tally.currentRevision)!;
    const approved = revisions.find((r) => r.revision === tally.approvedRevision) ?? null;
    const [values, events, agencies] = await Promise.all([
      this.revisions.valueOf(current),
      this.events.findAll({ where: { tallyId: tally.id }, order: [['id', 'ASC']] }),
      this.agenciesServedBy(tally.chapterId),
    ]);
    const [checkContext, names] = await Promise.all([
      this.checkContext.build(tally, values),
      this.namesOf([
        ...revisions.flatMap((r) => [r.createdBy, r.submittedBy, r.approvedBy]),
        ...events.map((event) => event.actorId),
      ]),
    ]);
    const lastReturn = events.filter((event) => event.kind === 'returned').at(-1);
    return {
      ...toTallySummary(tally, { current, approved, values, names, today: todayUtc() }),
      values,
      checkContext,
      checks: checkTally(values, checkContext),
      acknowledgedWarnings: acknowledgedWarningsOf(current),
      acknowledgementNote: current.acknowledgementNote,
      amendmentReason: current.amendmentReason,
      returnComment: tally.state === 'returned' ? (lastReturn?.comment ?? null) : null,
      revisions: revisions.map((revision) => toRevisionSummary(revision, names)),
      events: events.map((event) => toEventView(event, names)),
      agencies,
      allowedActions: allowedActions(actor, tally.state, current.submittedBy),
    };
  }

  async revision(actor: Actor, id: number, number: number): Promise<TallyRevisionView> {
    const tally = await this.findInScope(actor, id);
    const revision = await this.revisions.find(tally.id, number);
    if (!revision) {
      throw new NotFoundException(
        `This tally has no revision ${number}; its latest is ${tally.currentRevision}.`,
      );
    }
    const [values, names] = await Promise.all([
      this.revisions.valueOf(revision),
      this.namesOf([revision.createdBy, revision.submittedBy, revision.approvedBy]),
    ]);
    return {
      ...toRevisionSummary(revision, names),
      values,
      acknowledgedWarnings: acknowledgedWarningsOf(revision),
      acknowledgementNote: revision.acknowledgementNote,
    };
  }

  /**
   * Every month of the chapters in scope (or the one asked for) from a year ago, or the month the
   * chapter started, to the current month, newest first, with how each stands.
   */
  async calendar(actor: Actor, chapterId?: number): Promise<TallyCalendar> {
    const today = todayUtc();
    const current = monthOf(today);
    const earliest = addMonths(current, -CALENDAR_MONTHS_BACK);
    const chapters = await this.chapters.findAll({
      where: within(chapterScope(actor), {
        ...(chapterId !== undefined ? { id: chapterId } : {}),
        activeFrom: { [Op.lte]: monthEnd(current) },
        [Op.or]: [{ activeTo: null }, { activeTo: { [Op.gte]: monthStart(earliest) } }],
      }),
      order: [['name', 'ASC']],
    });
    if (chapterId !== undefined && chapters.length === 0) {
      const exists = await this.chapters.count({
        where: within(chapterScope(actor), { id: chapterId }),
      });
      if (!exists) throw new NotFoundException('No such chapter.');
    }
    const tallies = chapters.length
      ? await this.tallies.findAll({
          where: {
            chapterId: chapters.map((chapter) => chapter.id),
            month: { [Op.gte]: monthStart(earliest) },
          },
        })
      : [];
    const returnComments = await this.latestReturnComments(
      tallies.filter((tally) => tally.state === 'returned').map((tally) => tally.id),
    );
    const byChapterMonth = new Map(
      tallies.map((tally) => [`${tally.chapterId}/${monthKeyOf(tally.month)}`, tally]),
    );
    const entries: TallyCalendarEntry[] = [];
    for (const chapter of chapters) {
      const from = maxMonth(monthOf(chapter.activeFrom), earliest);
      const to = chapter.activeTo ? minMonth(monthOf(chapter.activeTo), current) : current;
      for (const month of monthsBetween(from, to)) {
        const tally = byChapterMonth.get(`${chapter.id}/${month}`);
        entries.push({
          chapterId: chapter.id,
          chapterName: chapter.name,
          month,
          dueOn: tallyDueOn(month, chapter.reportingDueDay),
          reporting: reportingStatus({
            month,
            dueDay: chapter.reportingDueDay,
            firstSubmittedAt: tally?.firstSubmittedAt?.toISOString() ?? null,
            today,
          }),
          tallyId: tally?.id ?? null,
          state: tally?.state ?? null,
          amendmentPending: tally ? isAmendmentPending(tally) : false,
          returnComment: tally ? (returnComments.get(tally.id) ?? null) : null,
        });
      }
    }
    // Newest month first; within a month, chapters by name (the order they were read in).
    entries.sort((a, b) => (a.month === b.month ? 0 : a.month < b.month ? 1 : -1));
    return { entries, today };
  }

  async findInScope(actor: Actor, id: number): Promise<MonthlyTally> {
    const tally = await this.tallies.findOne({
      where: within(tallyScope(actor), { id }),
      include: [TALLY_LIST_INCLUDE],
    });
    if (!tally) throw tallyNotFound();
    return tally;
  }

  /** Partner agencies linked to the chapter, by name. */
  private async agenciesServedBy(chapterId: number): Promise<TallyDetail['agencies']> {
    const rows = await this.agencies.findAll({
      include: [
        {
          model: Chapter,
          attributes: [],
          where: { id: chapterId },
          through: { attributes: [] },
          required: true,
        },
      ],
      order: [
        ['name', 'ASC'],
        ['id', 'ASC'],
      ],
    });
    return rows.map((agency) => ({ id: agency.id, name: agency.name, kind: agency.kind }));
  }

  private async latestReturnComments(tallyIds: number[]): Promise<Map<number, string | null>> {
    if (tallyIds.length === 0) return new Map();
    const rows = await this.events.findAll({
      where: { tallyId: tallyIds, kind: 'returned' },
      order: [['id', 'ASC']],
    });
    // Later rows overwrite earlier ones: the latest return wins.
    return new Map(rows.map((event) => [event.tallyId, event.comment]));
  }

  private async namesOf(ids: Array<number | null>): Promise<Names> {
    const wanted = [...new Set(ids.filter((id): id is number => id !== null))];
    if (wanted.length === 0) return new Map();
    const users = await this.users.findAll({
      where: { id: wanted },
      attributes: ['id', 'displayName'],
    });
    return new Map(users.map((user) => [user.id, user.displayName]));
  }
}

const maxMonth = (a: MonthKey, b: MonthKey) => (a > b ? a : b);
const minMonth = (a: MonthKey, b: MonthKey) => (a < b ? a : b);

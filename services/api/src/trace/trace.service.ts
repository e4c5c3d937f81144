import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import {
  can,
  TRACE_MEASURES,
  type Period,
  type SnapshotFigures,
  type SnapshotScope,
  type TraceReceipt,
  type TraceView,
} from '@tallyloom/core';
import { mergeSources, sourcesOfStoredSql, type SourceRevision } from '@tallyloom/reports';
import { QueryTypes } from 'sequelize';
import type { Actor } from '../common/access/actor';
import { jsonColumn } from '../common/sql/column-values';
import { ChapterFigures } from '../reports/chapter-figures.service';
import { ReportSnapshot } from '../reports/models/report-snapshot.model';
import { SettingsService } from '../settings/settings.service';
import type { TraceQuery } from './dto/trace.query';
import { TraceAmendments } from './trace-amendments';
import { TraceLines } from './trace-lines';
import { pickMeasures, recomputeFigures, sameFigures } from './trace-math';
import { chapterMonthKey, TraceReceipts } from './trace-receipts';
import { traceTargetOf } from './trace-reference';
import { TraceSubjects } from './trace-subject';

/**
 * The trace of a report figure: the stored snapshot row the dashboards read, the approved tally
 * revisions it names, their amendments and parcel receipts, and the figure re-added from them.
 */
@Injectable()
export class TraceService {
  constructor(
    @InjectModel(ReportSnapshot) private readonly snapshots: typeof ReportSnapshot,
    private readonly settings: SettingsService,
    private readonly subjects: TraceSubjects,
    private readonly lines: TraceLines,
    private readonly amendments: TraceAmendments,
    private readonly receipts: TraceReceipts,
    private readonly chapters: ChapterFigures,
  ) {}

  async trace(actor: Actor, reference: string, query: TraceQuery): Promise<TraceView> {
    const { fiscalYearStartMonth } = await this.settings.current();
    const target = traceTargetOf(reference, fiscalYearStartMonth);
    const subject = await this.subjects.resolve(actor, target);
    const { period } = target;
    const snapshot = await this.snapshotOf(subject, period);
    const counted = await this.lines.read(actor, snapshot.sourceRevisions);
    const [amendments, receipts] = await Promise.all([
      this.amendments.of(counted),
      // Every role that reads tallies reads receipts today; the check keeps the two apart.
      can(actor.role, 'receipts.read')
        ? this.receipts.of(actor, counted)
        : new Map<string, TraceReceipt[]>(),
    ]);
    const measures = query.measure ? [query.measure] : TRACE_MEASURES;
    const figure = pickMeasures(snapshot.figures, measures);
    const recomputed = pickMeasures(recomputeFigures(counted), measures);
    return {
      reference: target.reference,
      ...subject,
      period,
      measure: query.measure ?? null,
      figure,
      recomputed,
      agrees: sameFigures(figure, recomputed, measures),
      asOf: snapshot.asOf,
      tallies: counted.map((line) => ({
        tallyId: line.tallyId,
        chapterId: line.chapterId,
        chapterName: line.chapterName,
        regionName: line.regionName,
        month: line.month,
        revision: line.revision,
        approvedBy: line.approvedBy,
        approvedAt: line.approvedAt,
        value: pickMeasures(line.figures, measures),
        amendments: amendments.get(line.tallyId) ?? [],
        receipts: receipts.get(chapterMonthKey(line.chapterId, line.month)) ?? [],
      })),
    };
  }

  /**
   * The figures as the dashboards show them: a region's or the network's stored row, a
   * chapter's built now from its tallies (chapters have no stored rows).
   */
  private async snapshotOf(
    subject: { scope: SnapshotScope; scopeId: number | null; scopeName: string },
    period: Period,
  ): Promise<{ figures: SnapshotFigures; sourceRevisions: SourceRevision[]; asOf: string }> {
    if (subject.scope === 'chapter') {
      const [built] = await this.chapters.build([subject.scopeId!], [period]);
      if (built) {
        return {
          figures: built.figures,
          // A chapter's snapshot always lists its own.
          sourceRevisions: built.sourceRevisions ?? [],
          asOf: new Date().toISOString(),
        };
      }
    } else {
      const stored = await this.snapshots.findOne({
        where: {
          scope: subject.scope,
          scopeId: subject.scopeId ?? 0,
          periodKind: period.kind,
          periodKey: period.key,
        },
      });
      if (stored) {
        const own = jsonColumn<SourceRevision[] | null>(stored.sourceRevisions);
        return {
          figures: jsonColumn<SnapshotFigures>(stored.figures),
          sourceRevisions: own ?? (await this.sourcesThroughMonths(subject, period)),
          asOf: stored.asOf.toISOString(),
        };
      }
    }
    throw new NotFoundException(
      `No report snapshot of ${subject.scopeName} for ${period.label} has been built.`,
    );
  }

  /**
   * The revisions of a stored row that adds up region months, as those months list them. They
   * are written in the same transaction as the row, so they name exactly what it counted.
   */
  private async sourcesThroughMonths(
    subject: { scope: SnapshotScope; scopeId: number | null },
    period: Period,
  ): Promise<SourceRevision[]> {
    const scope = subject.scope === 'network' ? 'network' : 'region';
    const query = sourcesOfStoredSql(scope, subject.scopeId ?? 0, period);
    const rows = await this.snapshots.sequelize!.query<{ source_revisions: unknown }>(query.sql, {
      type: QueryTypes.SELECT,
      replacements: query.replacements,
    });
    return mergeSources(
      rows.map((row) => jsonColumn<SourceRevision[] | null>(row.source_revisions) ?? []),
    );
  }
}

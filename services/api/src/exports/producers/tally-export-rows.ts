import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { TallyListParams, TallySummary } from '@tallyloom/core';
import type { FindAttributeOptions, WhereOptions } from 'sequelize';
import { literal } from 'sequelize';
import type { Actor } from '../../common/access/actor';
import { within } from '../../common/access/scope';
import type { Chapter } from '../../chapters/models/chapter.model';
import { MonthlyTally } from '../../tallies/models/monthly-tally.model';
import {
  SUBMITTED_AT_SQL,
  TALLY_LIST_INCLUDE,
  TALLY_SORT_COLUMNS,
  tallyListFilters,
  tallyListOrder,
  tallySortKeys,
  type TallySortKey,
} from '../../tallies/tally-list-query';
import { TallyReader } from '../../tallies/tally-reader.service';
import { SCOPE_CHAPTER, tallyScope } from '../../tallies/tally-scope';
import type { ExportResult, ExportRun } from '../export-producer';
import type { ExportRow, ExportTableSpec } from '../writers/export-table';
import { after, type KeysetKey } from './keyset';
import { writeTableFile, type TableExportParams } from './table-file';

/** Fewer rows per read than receipts: each tally page also reads its revisions and lines. */
const TALLY_PAGE_SIZE = 1_000;

/** The submission time read beside each row, for the keyset of the submittedAt sort. */
const SORT_SUBMITTED_AT = 'sortSubmittedAt';

/**
 * The rows of GET /api/tallies (the tallies list and the review queue) for an export: the list's
 * own filters, scope and order, every page read by keyset, each row the list's own summary.
 */
@Injectable()
export class TallyExportRows {
  constructor(
    @InjectModel(MonthlyTally) private readonly tallies: typeof MonthlyTally,
    private readonly reader: TallyReader,
  ) {}

  /** Writes the person's rows as `spec`'s table, each row made by `cells`. */
  async write(
    params: TableExportParams<TallyListParams>,
    run: ExportRun,
    spec: ExportTableSpec,
    cells: (tally: TallySummary) => ExportRow,
  ): Promise<ExportResult> {
    const expected = await this.count(run.actor, params.filters);
    return writeTableFile(
      params,
      spec,
      this.rowsOf(run.actor, params.filters, cells),
      expected,
      run,
    );
  }

  count(actor: Actor, filters: TallyListParams): Promise<number> {
    return this.tallies.count({ where: this.whereOf(actor, filters), include: [SCOPE_CHAPTER] });
  }

  /** `pageSize` is the rows per read (smaller in tests, to cross many page boundaries). */
  async *pages(
    actor: Actor,
    filters: TallyListParams,
    pageSize = TALLY_PAGE_SIZE,
  ): AsyncIterable<TallySummary[]> {
    const where = this.whereOf(actor, filters);
    const keys = tallySortKeys(filters);
    const bySubmission = keys.some((key) => key.attribute === 'submittedAt');
    const attributes: FindAttributeOptions | undefined = bySubmission
      ? { include: [[literal(SUBMITTED_AT_SQL), SORT_SUBMITTED_AT]] }
      : undefined;
    let last: MonthlyTally | null = null;
    for (;;) {
      const rows: MonthlyTally[] = await this.tallies.findAll({
        where: last ? within(where, after(keys.map((key) => keyOf(key, last!)))) : where,
        attributes,
        include: [TALLY_LIST_INCLUDE],
        order: tallyListOrder(keys),
        limit: pageSize,
      });
      if (rows.length === 0) return;
      yield await this.reader.summariesOf(rows);
      if (rows.length < pageSize) return;
      last = rows[rows.length - 1];
    }
  }

  private async *rowsOf(
    actor: Actor,
    filters: TallyListParams,
    cells: (tally: TallySummary) => ExportRow,
  ): AsyncIterable<ExportRow[]> {
    for await (const page of this.pages(actor, filters)) yield page.map(cells);
  }

  private whereOf(actor: Actor, filters: TallyListParams): WhereOptions {
    return within(tallyScope(actor), tallyListFilters(filters));
  }
}

function keyOf(key: TallySortKey, row: MonthlyTally): KeysetKey {
  const column = TALLY_SORT_COLUMNS[key.attribute];
  switch (key.attribute) {
    case 'chapterName':
      return { column, direction: key.direction, value: (row.chapter as Chapter).name };
    case 'submittedAt':
      return {
        column,
        direction: key.direction,
        // A draft never submitted reads NULL here.
        value: row.get(SORT_SUBMITTED_AT) ?? null,
        nullable: true,
      };
    default:
      return { column, direction: key.direction, value: row.get(key.attribute) };
  }
}

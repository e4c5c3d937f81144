import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { TallyValues } from '@tallyloom/core';
import { Op, type Transaction } from 'sequelize';
import { TallyBlanketsAssembled } from './models/tally-blankets-assembled.model';
import { TallyBlanketsGiven } from './models/tally-blankets-given.model';
import { TallyPeopleServed } from './models/tally-people-served.model';
import { TallyRevision } from './models/tally-revision.model';
import { figuresOf, linesOf, valuesOf } from './tally-values';

/** Revisions and their child lines, read and written as whole TallyValues. */
@Injectable()
export class TallyRevisionsRepository {
  constructor(
    @InjectModel(TallyRevision) private readonly revisions: typeof TallyRevision,
    @InjectModel(TallyBlanketsAssembled) private readonly assembled: typeof TallyBlanketsAssembled,
    @InjectModel(TallyBlanketsGiven) private readonly given: typeof TallyBlanketsGiven,
    @InjectModel(TallyPeopleServed) private readonly peopleServed: typeof TallyPeopleServed,
  ) {}

  find(tallyId: number, revision: number, transaction?: Transaction) {
    return this.revisions.findOne({ where: { tallyId, revision }, transaction });
  }

  /** Every revision of a tally, oldest first. */
  allOf(tallyId: number): Promise<TallyRevision[]> {
    return this.revisions.findAll({ where: { tallyId }, order: [['revision', 'ASC']] });
  }

  /** The named revisions of several tallies in one query. */
  findMany(wanted: Array<{ tallyId: number; revision: number }>, transaction?: Transaction) {
    if (wanted.length === 0) return Promise.resolve([]);
    return this.revisions.findAll({
      where: { [Op.or]: wanted.map(({ tallyId, revision }) => ({ tallyId, revision })) },
      transaction,
    });
  }

  /** The values of each revision, by revision id, with its lines in three queries. */
  async valuesOf(
    revisions: TallyRevision[],
    transaction?: Transaction,
  ): Promise<Map<number, TallyValues>> {
    const ids = revisions.map((revision) => revision.id);
    if (ids.length === 0) return new Map();
    const where = { revisionId: ids };
    const [assembled, given, peopleServed] = await Promise.all([
      this.assembled.findAll({ where, transaction }),
      this.given.findAll({ where, transaction }),
      this.peopleServed.findAll({ where, transaction }),
    ]);
    const lines = { assembled, given, peopleServed };
    return new Map(revisions.map((revision) => [revision.id, valuesOf(revision, lines)]));
  }

  async valueOf(revision: TallyRevision, transaction?: Transaction): Promise<TallyValues> {
    return (await this.valuesOf([revision], transaction)).get(revision.id)!;
  }

  /** A new revision holding `values`, with its lines. */
  async create(
    fields: Pick<TallyRevision, 'tallyId' | 'revision' | 'createdBy'> &
      Partial<Pick<TallyRevision, 'amendmentReason'>>,
    values: TallyValues,
    transaction: Transaction,
  ): Promise<TallyRevision> {
    const revision = await this.revisions.create(
      { ...fields, state: 'draft', ...figuresOf(values) },
      { transaction },
    );
    await this.insertLines(values, revision.id, transaction);
    return revision;
  }

  /** Replaces the figures and lines of a revision with `values`. */
  async replaceValues(
    revision: TallyRevision,
    values: TallyValues,
    transaction: Transaction,
  ): Promise<void> {
    await revision.update(figuresOf(values), { transaction });
    const where = { revisionId: revision.id };
    await this.assembled.destroy({ where, transaction });
    await this.given.destroy({ where, transaction });
    await this.peopleServed.destroy({ where, transaction });
    await this.insertLines(values, revision.id, transaction);
  }

  private async insertLines(values: TallyValues, revisionId: number, transaction: Transaction) {
    const lines = linesOf(values, revisionId);
    if (lines.assembled.length > 0)
      await this.assembled.bulkCreate(lines.assembled, { transaction });
    if (lines.given.length > 0) await this.given.bulkCreate(lines.given, { transaction });
    if (lines.peopleServed.length > 0)
      await this.peopleServed.bulkCreate(lines.peopleServed, { transaction });
  }
}

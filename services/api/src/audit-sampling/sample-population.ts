import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { monthEnd, monthLabel, monthStart, type SamplePopulation } from '@tallyloom/core';
import { Op, type Transaction, type WhereOptions } from 'sequelize';
import { Chapter } from '../chapters/models/chapter.model';
import type { Actor } from '../common/access/actor';
import { chapterScope, regionScope, within } from '../common/access/scope';
import { invalidField } from '../common/validation/field-errors';
import { ParcelReceipt } from '../receipts/models/parcel-receipt.model';
import { receiptScope, SCOPE_CHAPTER } from '../receipts/receipt-scope';
import { Region } from '../regions/models/region.model';
import { MonthlyTally } from '../tallies/models/monthly-tally.model';
import { tallyScope } from '../tallies/tally-scope';

/** A population checked against the person's scope, with words to describe it. */
export interface ResolvedPopulation {
  population: SamplePopulation;
  /** "parcel receipts received in Alder Falls from Jan 2026 to Mar 2026" */
  description: string;
}

/**
 * The items a sample is drawn from. Parcel receipts count by the day they were received; monthly
 * tallies by their month, and only those with an approved revision: the figures that reach
 * reports and funders. Every query passes the person's own scope as well as the population's.
 */
@Injectable()
export class SamplePopulations {
  constructor(
    @InjectModel(ParcelReceipt) private readonly receipts: typeof ParcelReceipt,
    @InjectModel(MonthlyTally) private readonly tallies: typeof MonthlyTally,
    @InjectModel(Region) private readonly regions: typeof Region,
    @InjectModel(Chapter) private readonly chapters: typeof Chapter,
  ) {}

  /**
   * Checks the population's scope and months; `field` prefixes the names of problems
   * ('population' or 'plan.population'). A region or chapter outside the person's scope is 404.
   */
  async resolve(actor: Actor, given: SamplePopulation, field: string): Promise<ResolvedPopulation> {
    if (given.from > given.to) {
      throw invalidField(
        `${field}.to`,
        `to (${given.to}) must not be before from (${given.from}).`,
      );
    }
    const months = `from ${monthLabel(given.from)} to ${monthLabel(given.to)}`;
    const what =
      given.kind === 'parcel-receipts' ? 'parcel receipts received' : 'approved monthly tallies';
    if (given.scope === 'network') {
      if (given.scopeId !== undefined) {
        throw invalidField(`${field}.scopeId`, 'Leave scopeId out for the whole network.');
      }
      const population = { kind: given.kind, scope: given.scope, from: given.from, to: given.to };
      return { population, description: `${what} in the network ${months}` };
    }
    if (given.scopeId === undefined) {
      throw invalidField(`${field}.scopeId`, `scopeId is required for a ${given.scope}.`);
    }
    const place =
      given.scope === 'region'
        ? await this.regions.findOne({ where: within(regionScope(actor), { id: given.scopeId }) })
        : await this.chapters.findOne({
            where: within(chapterScope(actor), { id: given.scopeId }),
          });
    if (!place) throw new NotFoundException(`No such ${given.scope}.`);
    const population = {
      kind: given.kind,
      scope: given.scope,
      scopeId: given.scopeId,
      from: given.from,
      to: given.to,
    };
    return { population, description: `${what} in ${place.name} ${months}` };
  }

  async count(actor: Actor, population: SamplePopulation): Promise<number> {
    return population.kind === 'parcel-receipts'
      ? this.receipts.count({
          where: this.receiptsWhere(actor, population),
          include: [SCOPE_CHAPTER],
        })
      : this.tallies.count({
          where: this.talliesWhere(actor, population),
          include: [SCOPE_CHAPTER],
        });
  }

  /** Every id of the population, ascending (the draw sorts them again: the order is its own). */
  async ids(
    actor: Actor,
    population: SamplePopulation,
    transaction: Transaction,
  ): Promise<number[]> {
    const options = {
      attributes: ['id'],
      include: [SCOPE_CHAPTER],
      order: [['id', 'ASC']] as [string, string][],
      raw: true,
      transaction,
    };
    const rows: { id: number }[] =
      population.kind === 'parcel-receipts'
        ? await this.receipts.findAll({ ...options, where: this.receiptsWhere(actor, population) })
        : await this.tallies.findAll({ ...options, where: this.talliesWhere(actor, population) });
    return rows.map((row) => Number(row.id));
  }

  private receiptsWhere(actor: Actor, population: SamplePopulation): WhereOptions {
    return within(receiptScope(actor), {
      [Op.and]: [
        { receivedOn: { [Op.between]: [monthStart(population.from), monthEnd(population.to)] } },
        placeFilter(population),
      ],
    });
  }

  private talliesWhere(actor: Actor, population: SamplePopulation): WhereOptions {
    return within(tallyScope(actor), {
      [Op.and]: [
        { month: { [Op.between]: [monthStart(population.from), monthStart(population.to)] } },
        { approvedRevision: { [Op.ne]: null } },
        placeFilter(population),
      ],
    });
  }
}

/** Both populations are keyed by chapter, with the region through SCOPE_CHAPTER. */
function placeFilter(population: SamplePopulation): WhereOptions {
  switch (population.scope) {
    case 'network':
      return {};
    case 'region':
      return { '$chapter.region_id$': population.scopeId };
    case 'chapter':
      return { chapterId: population.scopeId };
  }
}

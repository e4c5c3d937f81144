import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import {
  DomainError,
  drawSample,
  newSeed,
  type DrawSampleRequest,
  type SamplePlanRequest,
  type SamplePlanView,
} from '@tallyloom/core';
import { fn, col, literal } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import type { Actor } from '../common/access/actor';
import { within } from '../common/access/scope';
import type { SignedInContext } from '../common/context/request-context';
import { invalidField } from '../common/validation/field-errors';
import { User } from '../users/models/user.model';
import type { AuditSampleDto, AuditSamplePageDto } from './dto/audit-sample-view.dto';
import type { ListSamplesQuery } from './dto/list-samples.query';
import { AuditSampleItem } from './models/audit-sample-item.model';
import { AuditSample } from './models/audit-sample.model';
import { planFor } from './sample-plan';
import { SamplePopulations } from './sample-population';
import { sampleScope } from './sample-scope';
import { toSampleView, toSummaryView, type WorksheetCounts } from './sample.mappers';

export const SAMPLE_ENTITY = 'audit_sample';

const DRAWER = { model: User, as: 'drawer', attributes: ['id', 'displayName'] };

@Injectable()
export class AuditSamplesService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(AuditSample) private readonly samples: typeof AuditSample,
    @InjectModel(AuditSampleItem) private readonly items: typeof AuditSampleItem,
    private readonly populations: SamplePopulations,
    private readonly audit: AuditService,
  ) {}

  /** A preview: the population counted now and the sample size it needs. Nothing is stored. */
  async plan(actor: Actor, request: SamplePlanRequest): Promise<SamplePlanView> {
    const { population, description } = await this.populations.resolve(
      actor,
      request.population,
      'population',
    );
    const size = await this.populations.count(actor, population);
    return planFor(request, population, size, description);
  }

  /**
   * Reads the population's ids, plans on their number and draws, all in one transaction with the
   * audit entry, so the stored plan, population size and items describe the same moment.
   */
  async draw(context: SignedInContext, request: DrawSampleRequest): Promise<AuditSampleDto> {
    const { actor } = context;
    const { population, description } = await this.populations.resolve(
      actor,
      request.plan.population,
      'plan.population',
    );
    const seed = request.seed ?? newSeed();
    const id = await this.sequelize.transaction(async (transaction) => {
      const ids = await this.populations.ids(actor, population, transaction);
      const plan = planFor(request.plan, population, ids.length, description, 'plan.');
      let drawn: ReturnType<typeof drawSample>;
      try {
        drawn = drawSample(ids, plan.itemsToDraw, seed);
      } catch (error) {
        if (error instanceof DomainError && error.argument === 'seed') {
          throw invalidField('seed', error.message);
        }
        throw error;
      }
      const sample = await this.samples.create(
        {
          population,
          plan,
          seed,
          prng: drawn.prng,
          populationSize: ids.length,
          drawnBy: actor.id,
          drawnAt: new Date(),
        },
        { transaction },
      );
      await this.items.bulkCreate(
        drawn.drawOrder.map((itemId, index) => ({
          sampleId: sample.id,
          position: index + 1,
          itemId,
        })),
        { transaction },
      );
      await this.audit.record(
        context,
        {
          action: 'audit_sample.drawn',
          entityType: SAMPLE_ENTITY,
          entityId: sample.id,
          after: {
            population,
            populationSize: ids.length,
            itemsToDraw: plan.itemsToDraw,
            seed,
            prng: drawn.prng,
            drawOrder: drawn.drawOrder,
          },
        },
        transaction,
      );
      return sample.id;
    });
    return this.get(actor, id);
  }

  async list(actor: Actor, query: ListSamplesQuery): Promise<AuditSamplePageDto> {
    const page = query.page ?? 1;
    const pageSize = query.pageSize ?? 25;
    const { rows, count } = await this.samples.findAndCountAll({
      where: sampleScope(actor),
      include: [DRAWER],
      order: [
        ['drawnAt', 'DESC'],
        ['id', 'DESC'],
      ],
      limit: pageSize,
      offset: (page - 1) * pageSize,
      distinct: true,
    });
    const counts = await this.countsOf(rows.map((sample) => sample.id));
    return {
      items: rows.map((sample) =>
        toSummaryView(sample, counts.get(sample.id) ?? { items: 0, examined: 0, deviations: 0 }),
      ),
      total: count,
      page,
      pageSize,
    };
  }

  async get(actor: Actor, id: number): Promise<AuditSampleDto> {
    const sample = await this.findInScope(actor, id);
    const items = await this.items.findAll({
      where: { sampleId: id },
      order: [['position', 'ASC']],
    });
    return toSampleView(sample, items);
  }

  /** The sample if the person may see it; 404 otherwise, as for one that does not exist. */
  async findInScope(actor: Actor, id: number): Promise<AuditSample> {
    const sample = await this.samples.findOne({
      where: within(sampleScope(actor), { id }),
      include: [DRAWER],
    });
    if (!sample) throw new NotFoundException('No such audit sample.');
    return sample;
  }

  private async countsOf(sampleIds: number[]): Promise<Map<number, WorksheetCounts>> {
    if (sampleIds.length === 0) return new Map();
    const rows = (await this.items.findAll({
      attributes: [
        'sampleId',
        [fn('COUNT', col('id')), 'items'],
        [literal('SUM(result IS NOT NULL)'), 'examined'],
        [literal("SUM(result = 'deviation')"), 'deviations'],
      ],
      where: { sampleId: sampleIds },
      group: ['sampleId'],
      raw: true,
    })) as unknown as {
      sampleId: number;
      items: unknown;
      examined: unknown;
      deviations: unknown;
    }[];
    return new Map(
      rows.map((row) => [
        Number(row.sampleId),
        {
          items: Number(row.items),
          examined: Number(row.examined ?? 0),
          deviations: Number(row.deviations ?? 0),
        },
      ]),
    );
  }
}

import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { ROLE_SCOPE } from '@tallyloom/core';
import { Op, type Transaction, type WhereOptions } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import type { Actor } from '../common/access/actor';
import { regionScope, within } from '../common/access/scope';
import type { SignedInContext } from '../common/context/request-context';
import { asTakenField, invalidField, refuseIfTaken } from '../common/validation/field-errors';
import { isCalendarDate } from '../common/validation/fields';
import { Region } from '../regions/models/region.model';
import {
  normaliseCampaignCode,
  type CampaignDto,
  type ListCampaignsQuery,
  type SaveCampaignDto,
  type UpdateCampaignDto,
} from './dto/campaign.dto';
import { Campaign } from './models/campaign.model';

const TAKEN = { code: { field: 'code', message: 'Another campaign already has this code.' } };

const WITH_REGION_NAME = [{ model: Region, attributes: ['id', 'name'] }];

@Injectable()
export class CampaignsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Campaign) private readonly campaigns: typeof Campaign,
    @InjectModel(Region) private readonly regions: typeof Region,
    private readonly audit: AuditService,
  ) {}

  /** Campaigns the person may see, latest start first. */
  async list(actor: Actor, query: ListCampaignsQuery): Promise<CampaignDto[]> {
    const filters: WhereOptions = query.activeOn
      ? { startsOn: { [Op.lte]: query.activeOn }, endsOn: { [Op.gte]: query.activeOn } }
      : {};
    const rows = await this.campaigns.findAll({
      where: within(campaignScope(actor), filters),
      include: WITH_REGION_NAME,
      order: [
        ['startsOn', 'DESC'],
        ['code', 'ASC'],
      ],
    });
    return rows.map(toCampaignDto);
  }

  /** One campaign in scope; out of scope is reported exactly like one that does not exist. */
  async get(actor: Actor, id: number): Promise<CampaignDto> {
    const row = await this.campaigns.findOne({
      where: within(campaignScope(actor), { id }),
      include: WITH_REGION_NAME,
    });
    if (!row) throw new NotFoundException('No such campaign.');
    return toCampaignDto(row);
  }

  /**
   * The campaign a parcel's label code credits: the code matches whatever its case or spacing,
   * the campaign runs on `onDate` (YYYY-MM-DD, both end days included), and a regional campaign
   * only credits chapters of its own region (`regionId` is the receiving chapter's region).
   * Null when nothing matches.
   */
  async findCreditable(code: string, onDate: string, regionId: number): Promise<Campaign | null> {
    const normalised = normaliseCampaignCode(code);
    if (!normalised || !isCalendarDate(onDate)) return null;
    return this.campaigns.findOne({
      where: {
        code: normalised,
        startsOn: { [Op.lte]: onDate },
        endsOn: { [Op.gte]: onDate },
        [Op.or]: [{ regionId: null }, { regionId }],
      },
    });
  }

  async create(context: SignedInContext, body: SaveCampaignDto): Promise<CampaignDto> {
    const fields = {
      code: body.code,
      name: body.name,
      goalPanels: body.goalPanels,
      startsOn: body.startsOn,
      endsOn: body.endsOn,
      regionId: body.regionId ?? null,
    };
    const campaign = await this.sequelize
      .transaction(async (transaction) => {
        await this.check(fields, body, null, transaction);
        const created = await this.campaigns.create(fields, { transaction });
        await this.audit.record(
          context,
          {
            action: 'campaign.created',
            entityType: 'campaign',
            entityId: created.id,
            after: auditableCampaign(created),
          },
          transaction,
        );
        return created;
      })
      .catch((error: unknown) => {
        throw asTakenField(error, TAKEN);
      });
    return this.get(context.actor, campaign.id);
  }

  async update(
    context: SignedInContext,
    id: number,
    body: UpdateCampaignDto,
  ): Promise<CampaignDto> {
    await this.sequelize
      .transaction(async (transaction) => {
        const campaign = await this.campaigns.findByPk(id, { transaction, lock: true });
        if (!campaign) throw new NotFoundException('No such campaign.');
        const before = auditableCampaign(campaign);
        const fields = {
          code: body.code ?? campaign.code,
          name: body.name ?? campaign.name,
          goalPanels: body.goalPanels ?? campaign.goalPanels,
          startsOn: body.startsOn ?? campaign.startsOn,
          endsOn: body.endsOn ?? campaign.endsOn,
          regionId: body.regionId !== undefined ? body.regionId : campaign.regionId,
        };
        await this.check(fields, body, id, transaction);
        await campaign.update(fields, { transaction });
        const after = auditableCampaign(campaign);
        await this.audit.recordChange(
          context,
          { action: 'campaign.updated', entityType: 'campaign', entityId: id, before, after },
          transaction,
        );
      })
      .catch((error: unknown) => {
        throw asTakenField(error, TAKEN);
      });
    return this.get(context.actor, id);
  }

  /** The rules a campaign keeps once the fields are merged. */
  private async check(
    fields: { code: string; startsOn: string; endsOn: string; regionId: number | null },
    sent: Partial<SaveCampaignDto>,
    exceptId: number | null,
    transaction: Transaction,
  ): Promise<void> {
    if (fields.endsOn < fields.startsOn) {
      // Name the field that was sent: a new start can overtake the stored end.
      const field = sent.endsOn === undefined ? 'startsOn' : 'endsOn';
      throw invalidField(
        field,
        field === 'endsOn'
          ? `endsOn must be on or after startsOn (${fields.startsOn}).`
          : `startsOn must be on or before the campaign's endsOn (${fields.endsOn}).`,
      );
    }
    if (
      sent.regionId !== undefined &&
      fields.regionId !== null &&
      !(await this.regions.findByPk(fields.regionId, { transaction }))
    )
      throw invalidField('regionId', 'No such region.');
    if (sent.code !== undefined)
      await refuseIfTaken(this.campaigns, { code: fields.code }, exceptId, transaction, TAKEN.code);
  }
}

/**
 * Network-wide campaigns are everyone's; a regional one is seen by the people of that region
 * (coordinators and the leads of its chapters) and by network roles.
 */
function campaignScope(actor: Actor): WhereOptions {
  if (ROLE_SCOPE[actor.role] === 'network') return {};
  return { [Op.or]: [{ regionId: null }, regionScope(actor, 'regionId')] };
}

function toCampaignDto(campaign: Campaign): CampaignDto {
  return {
    id: campaign.id,
    code: campaign.code,
    name: campaign.name,
    goalPanels: campaign.goalPanels,
    startsOn: campaign.startsOn,
    endsOn: campaign.endsOn,
    regionId: campaign.regionId ?? null,
    regionName: campaign.region?.name ?? null,
  };
}

function auditableCampaign(campaign: Campaign): Record<string, unknown> {
  return {
    code: campaign.code,
    name: campaign.name,
    goalPanels: campaign.goalPanels,
    startsOn: campaign.startsOn,
    endsOn: campaign.endsOn,
    regionId: campaign.regionId ?? null,
  };
}

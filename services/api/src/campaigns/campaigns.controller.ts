import { Body, Controller, Get, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { IdParam } from '../common/pipes/id-param';
import { CampaignsService } from './campaigns.service';
import {
  CampaignDto,
  ListCampaignsQuery,
  SaveCampaignDto,
  UpdateCampaignDto,
} from './dto/campaign.dto';

@ApiTags('network')
@ApiBearerAuth()
@Controller('campaigns')
@Allow('network.read')
export class CampaignsController {
  constructor(private readonly campaigns: CampaignsService) {}

  @Get()
  @ApiOkResponse({
    type: [CampaignDto],
    description: 'Network-wide campaigns and those of your region, latest start first',
  })
  list(
    @Query() query: ListCampaignsQuery,
    @Ctx() context: SignedInContext,
  ): Promise<CampaignDto[]> {
    return this.campaigns.list(context.actor, query);
  }

  @Get(':id')
  @ApiOkResponse({ type: CampaignDto })
  get(@IdParam() id: number, @Ctx() context: SignedInContext): Promise<CampaignDto> {
    return this.campaigns.get(context.actor, id);
  }

  @Post()
  @Allow('network.manage')
  @ApiCreatedResponse({ type: CampaignDto, description: 'Created; the code is unique (409)' })
  create(@Body() body: SaveCampaignDto, @Ctx() context: SignedInContext): Promise<CampaignDto> {
    return this.campaigns.create(context, body);
  }

  @Patch(':id')
  @Allow('network.manage')
  @ApiOkResponse({ type: CampaignDto, description: 'Changes only the fields sent' })
  update(
    @IdParam() id: number,
    @Body() body: UpdateCampaignDto,
    @Ctx() context: SignedInContext,
  ): Promise<CampaignDto> {
    return this.campaigns.update(context, id, body);
  }
}

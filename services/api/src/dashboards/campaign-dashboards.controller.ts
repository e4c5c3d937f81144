import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { IdParam } from '../common/pipes/id-param';
import { CampaignProgressService } from './campaign-progress.service';
import { CampaignProgressDto } from './dto/campaign-progress.dto';

@ApiTags('dashboards')
@ApiBearerAuth()
@Controller('dashboards/campaigns')
@Allow('reports.read')
export class CampaignDashboardsController {
  constructor(private readonly progress: CampaignProgressService) {}

  @Get()
  @ApiOkResponse({
    type: [CampaignProgressDto],
    description: 'Campaigns in your scope with their progress, latest start first',
  })
  list(@Ctx() context: SignedInContext): Promise<CampaignProgressDto[]> {
    return this.progress.list(context.actor);
  }

  @Get(':id')
  @ApiOkResponse({
    type: CampaignProgressDto,
    description: 'Credited panels, pace, pace still needed and projection',
  })
  get(@IdParam() id: number, @Ctx() context: SignedInContext): Promise<CampaignProgressDto> {
    return this.progress.get(context.actor, id);
  }
}

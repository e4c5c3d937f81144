import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiForbiddenResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { IdParam } from '../common/pipes/id-param';
import { DashboardsService } from './dashboards.service';
import { DashboardQuery } from './dto/dashboard.query';
import { DashboardViewDto } from './dto/dashboard-view.dto';

@ApiTags('dashboards')
@ApiBearerAuth()
@Controller('dashboards')
@Allow('reports.read')
export class DashboardsController {
  constructor(private readonly dashboards: DashboardsService) {}

  @Get('network')
  @ApiOkResponse({
    type: DashboardViewDto,
    description: 'The network: current, previous, monthly trend, by region',
  })
  @ApiForbiddenResponse({ description: 'Regional and chapter roles: use your own dashboard' })
  network(
    @Query() query: DashboardQuery,
    @Ctx() context: SignedInContext,
  ): Promise<DashboardViewDto> {
    return this.dashboards.network(context.actor, query);
  }

  @Get('regions/:id')
  @ApiOkResponse({ type: DashboardViewDto, description: 'A region in your scope, by chapter' })
  region(
    @IdParam() id: number,
    @Query() query: DashboardQuery,
    @Ctx() context: SignedInContext,
  ): Promise<DashboardViewDto> {
    return this.dashboards.region(context.actor, id, query);
  }

  @Get('chapters/:id')
  @ApiOkResponse({ type: DashboardViewDto, description: 'A chapter in your scope' })
  chapter(
    @IdParam() id: number,
    @Query() query: DashboardQuery,
    @Ctx() context: SignedInContext,
  ): Promise<DashboardViewDto> {
    return this.dashboards.chapter(context.actor, id, query);
  }
}

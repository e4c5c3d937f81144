import { Body, Controller, Get, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { IdParam } from '../common/pipes/id-param';
import { AgenciesService } from './agencies.service';
import {
  ListAgenciesQuery,
  PartnerAgencyDto,
  SavePartnerAgencyDto,
  UpdatePartnerAgencyDto,
} from './dto/partner-agency.dto';

@ApiTags('network')
@ApiBearerAuth()
@Controller('agencies')
@Allow('network.read')
export class AgenciesController {
  constructor(private readonly agencies: AgenciesService) {}

  @Get()
  @ApiOkResponse({
    type: [PartnerAgencyDto],
    description: 'Partner agencies served by a chapter in your scope, by name',
  })
  list(
    @Query() query: ListAgenciesQuery,
    @Ctx() context: SignedInContext,
  ): Promise<PartnerAgencyDto[]> {
    return this.agencies.list(context.actor, query);
  }

  @Get(':id')
  @ApiOkResponse({ type: PartnerAgencyDto })
  get(@IdParam() id: number, @Ctx() context: SignedInContext): Promise<PartnerAgencyDto> {
    return this.agencies.get(context.actor, id);
  }

  @Post()
  @Allow('network.manage')
  @ApiCreatedResponse({ type: PartnerAgencyDto, description: 'Created; the name is unique (409)' })
  create(
    @Body() body: SavePartnerAgencyDto,
    @Ctx() context: SignedInContext,
  ): Promise<PartnerAgencyDto> {
    return this.agencies.create(context, body);
  }

  @Patch(':id')
  @Allow('network.manage')
  @ApiOkResponse({ type: PartnerAgencyDto, description: 'Changes only the fields sent' })
  update(
    @IdParam() id: number,
    @Body() body: UpdatePartnerAgencyDto,
    @Ctx() context: SignedInContext,
  ): Promise<PartnerAgencyDto> {
    return this.agencies.update(context, id, body);
  }
}

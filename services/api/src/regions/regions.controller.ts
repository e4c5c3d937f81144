import { Body, Controller, Get, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { IdParam } from '../common/pipes/id-param';
import { RegionDto } from './dto/region.dto';
import { SaveRegionDto, UpdateRegionDto } from './dto/save-region.dto';
import { RegionsService } from './regions.service';

@ApiTags('network')
@ApiBearerAuth()
@Controller('regions')
@Allow('network.read')
export class RegionsController {
  constructor(private readonly regions: RegionsService) {}

  @Get()
  @ApiOkResponse({
    type: [RegionDto],
    description: 'The regions in your scope, by name, with their number of chapters',
  })
  list(@Ctx() context: SignedInContext): Promise<RegionDto[]> {
    return this.regions.list(context.actor);
  }

  @Get(':id')
  @ApiOkResponse({ type: RegionDto })
  get(@IdParam() id: number, @Ctx() context: SignedInContext): Promise<RegionDto> {
    return this.regions.get(context.actor, id);
  }

  @Post()
  @Allow('network.manage')
  @ApiCreatedResponse({ type: RegionDto, description: 'Created; name and code are unique (409)' })
  create(@Body() body: SaveRegionDto, @Ctx() context: SignedInContext): Promise<RegionDto> {
    return this.regions.create(context, body);
  }

  @Patch(':id')
  @Allow('network.manage')
  @ApiOkResponse({ type: RegionDto, description: 'Changes only the fields sent' })
  update(
    @IdParam() id: number,
    @Body() body: UpdateRegionDto,
    @Ctx() context: SignedInContext,
  ): Promise<RegionDto> {
    return this.regions.update(context, id, body);
  }
}

import { Body, Controller, Get, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { IdParam } from '../common/pipes/id-param';
import {
  SaveVolunteerHourValueDto,
  UpdateVolunteerHourValueDto,
  VolunteerHourValueDto,
} from './dto/volunteer-hour-value.dto';
import { VolunteerHourValuesService } from './volunteer-hour-values.service';

@ApiTags('settings')
@ApiBearerAuth()
@Controller('settings/volunteer-hour-values')
@Allow('network.read')
export class VolunteerHourValuesController {
  constructor(private readonly values: VolunteerHourValuesService) {}

  @Get()
  @ApiOkResponse({
    type: [VolunteerHourValueDto],
    description: 'The value of a volunteer hour per data year, newest first, with its source',
  })
  list(): Promise<VolunteerHourValueDto[]> {
    return this.values.list();
  }

  @Post()
  @Allow('network.manage')
  @ApiCreatedResponse({
    type: VolunteerHourValueDto,
    description: 'Created; one value per data year (409)',
  })
  create(
    @Body() body: SaveVolunteerHourValueDto,
    @Ctx() context: SignedInContext,
  ): Promise<VolunteerHourValueDto> {
    return this.values.create(context, body);
  }

  @Patch(':id')
  @Allow('network.manage')
  @ApiOkResponse({ type: VolunteerHourValueDto, description: 'Changes only the fields sent' })
  update(
    @IdParam() id: number,
    @Body() body: UpdateVolunteerHourValueDto,
    @Ctx() context: SignedInContext,
  ): Promise<VolunteerHourValueDto> {
    return this.values.update(context, id, body);
  }
}

import { Body, Controller, Get, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { IdParam } from '../common/pipes/id-param';
import { BlanketSizesService } from './blanket-sizes.service';
import {
  BlanketSizeDto,
  ListBlanketSizesQuery,
  SaveBlanketSizeDto,
  UpdateBlanketSizeDto,
} from './dto/blanket-size.dto';

@ApiTags('network')
@ApiBearerAuth()
@Controller('blanket-sizes')
@Allow('network.read')
export class BlanketSizesController {
  constructor(private readonly sizes: BlanketSizesService) {}

  @Get()
  @ApiOkResponse({
    type: [BlanketSizeDto],
    description: 'The blanket size catalogue in list order, with panels and finished size',
  })
  list(
    @Query() query: ListBlanketSizesQuery,
    @Ctx() context: SignedInContext,
  ): Promise<BlanketSizeDto[]> {
    return this.sizes.list(context.actor, query);
  }

  @Post()
  @Allow('network.manage')
  @ApiCreatedResponse({ type: BlanketSizeDto, description: 'Created; the name is unique (409)' })
  create(
    @Body() body: SaveBlanketSizeDto,
    @Ctx() context: SignedInContext,
  ): Promise<BlanketSizeDto> {
    return this.sizes.create(context, body);
  }

  @Patch(':id')
  @Allow('network.manage')
  @ApiOkResponse({ type: BlanketSizeDto, description: 'Changes only the fields sent' })
  update(
    @IdParam() id: number,
    @Body() body: UpdateBlanketSizeDto,
    @Ctx() context: SignedInContext,
  ): Promise<BlanketSizeDto> {
    return this.sizes.update(context, id, body);
  }
}

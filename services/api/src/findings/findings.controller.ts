import {
  Body,
  Controller,
  Get,
  HttpCode,
  HttpStatus,
  Patch,
  Post,
  Query,
  UseFilters,
} from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { StaleVersionFilter } from '../common/filters/stale-version.filter';
import { IdParam } from '../common/pipes/id-param';
import {
  CloseFindingDto,
  CreateFindingDto,
  FindingResponseDto,
  UpdateFindingDto,
} from './dto/finding-requests.dto';
import { FindingDto, FindingPageDto } from './dto/finding-view.dto';
import { ListFindingsQuery } from './dto/list-findings.query';
import { FindingsService } from './findings.service';

const STALE = 'A newer version exists, or the finding is closed; a stale one carries `current`';

@ApiTags('audit findings')
@ApiBearerAuth()
@Controller('findings')
export class FindingsController {
  constructor(private readonly findings: FindingsService) {}

  @Get()
  @Allow('findings.read')
  @ApiOkResponse({ type: FindingPageDto, description: 'Newest first' })
  list(
    @Query() query: ListFindingsQuery,
    @Ctx() context: SignedInContext,
  ): Promise<FindingPageDto> {
    return this.findings.list(context.actor, query);
  }

  @Post()
  @Allow('findings.write')
  @ApiCreatedResponse({ type: FindingDto })
  create(@Body() body: CreateFindingDto, @Ctx() context: SignedInContext): Promise<FindingDto> {
    return this.findings.create(context, body);
  }

  @Get(':id')
  @Allow('findings.read')
  @ApiOkResponse({ type: FindingDto, description: 'With its links and responses, oldest first' })
  get(@IdParam() id: number, @Ctx() context: SignedInContext): Promise<FindingDto> {
    return this.findings.get(context.actor, id);
  }

  @Patch(':id')
  @Allow('findings.write')
  @UseFilters(StaleVersionFilter)
  @ApiOkResponse({ type: FindingDto, description: "The author's edit" })
  @ApiConflictResponse({ description: STALE })
  update(
    @IdParam() id: number,
    @Body() body: UpdateFindingDto,
    @Ctx() context: SignedInContext,
  ): Promise<FindingDto> {
    return this.findings.update(context, id, body);
  }

  @Post(':id/responses')
  @Allow('findings.respond')
  @ApiCreatedResponse({ type: FindingDto, description: 'The finding with the response added' })
  @ApiConflictResponse({ description: 'The finding is closed' })
  respond(
    @IdParam() id: number,
    @Body() body: FindingResponseDto,
    @Ctx() context: SignedInContext,
  ): Promise<FindingDto> {
    return this.findings.respond(context, id, body);
  }

  @Post(':id/close')
  @Allow('findings.write')
  @HttpCode(HttpStatus.OK)
  @UseFilters(StaleVersionFilter)
  @ApiOkResponse({ type: FindingDto })
  @ApiConflictResponse({ description: STALE })
  close(
    @IdParam() id: number,
    @Body() body: CloseFindingDto,
    @Ctx() context: SignedInContext,
  ): Promise<FindingDto> {
    return this.findings.close(context, id, body);
  }
}

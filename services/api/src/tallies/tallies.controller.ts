import {
  applyDecorators,
  Body,
  Controller,
  Get,
  Headers,
  HttpCode,
  HttpStatus,
  Post,
  Put,
  Query,
  UseFilters,
  UseGuards,
} from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiHeader,
  ApiOkResponse,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import type { Policy } from '@tallyloom/core';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { StaleVersionFilter } from '../common/filters/stale-version.filter';
import { IdParam } from '../common/pipes/id-param';
import { ListTalliesQuery, TallyCalendarQuery } from './dto/list-tallies.query';
import {
  AmendTallyDto,
  ApproveTallyDto,
  CreateTallyDto,
  ReturnTallyDto,
  SaveTallyDto,
  SubmitTallyDto,
} from './dto/tally-requests.dto';
import {
  TallyCalendarDto,
  TallyDetailDto,
  TallyPageDto,
  TallyRevisionViewDto,
} from './dto/tally-view.dto';
import { TalliesService } from './tallies.service';
import { TallyInScopeGuard } from './tally-in-scope.guard';
import { TallyReader } from './tally-reader.service';
import { TallyReviewService } from './tally-review.service';

/**
 * A write to one tally: the policy, 404 before the body is read when the tally is out of scope,
 * 200 with the tally, and a 409 that carries the current tally when the version is stale.
 */
const TallyWrite = (policy: Policy) =>
  applyDecorators(
    Allow(policy),
    UseGuards(TallyInScopeGuard),
    UseFilters(StaleVersionFilter),
    HttpCode(HttpStatus.OK),
    ApiOkResponse({ type: TallyDetailDto }),
    ApiConflictResponse({
      description:
        'A newer version exists (the body carries it as `current`), or the flow does not allow this step now',
    }),
  );

@ApiTags('tallies')
@ApiBearerAuth()
@Controller('tallies')
export class TalliesController {
  constructor(
    private readonly reader: TallyReader,
    private readonly tallies: TalliesService,
    private readonly review: TallyReviewService,
  ) {}

  @Get()
  @Allow('tallies.read')
  @ApiOkResponse({ type: TallyPageDto })
  list(@Query() query: ListTalliesQuery, @Ctx() context: SignedInContext): Promise<TallyPageDto> {
    return this.reader.list(context.actor, query);
  }

  // Before ':id', so 'calendar' is never read as an id.
  @Get('calendar')
  @Allow('tallies.read')
  @ApiOkResponse({ type: TallyCalendarDto, description: 'Newest month first' })
  calendar(
    @Query() query: TallyCalendarQuery,
    @Ctx() context: SignedInContext,
  ): Promise<TallyCalendarDto> {
    return this.reader.calendar(context.actor, query.chapterId);
  }

  @Post()
  @Allow('tallies.write')
  @ApiCreatedResponse({ type: TallyDetailDto, description: 'Revision 1, prefilled' })
  @ApiConflictResponse({ description: 'The chapter-month has a tally, or last month has none' })
  create(@Body() body: CreateTallyDto, @Ctx() context: SignedInContext): Promise<TallyDetailDto> {
    return this.tallies.create(context, body);
  }

  @Get(':id')
  @Allow('tallies.read')
  @ApiOkResponse({ type: TallyDetailDto })
  get(@IdParam() id: number, @Ctx() context: SignedInContext): Promise<TallyDetailDto> {
    return this.reader.detail(context.actor, id);
  }

  @Get(':id/revisions/:revision')
  @Allow('tallies.read')
  @ApiOkResponse({ type: TallyRevisionViewDto })
  revision(
    @IdParam() id: number,
    @IdParam('revision') revision: number,
    @Ctx() context: SignedInContext,
  ): Promise<TallyRevisionViewDto> {
    return this.reader.revision(context.actor, id, revision);
  }

  @Put(':id')
  @TallyWrite('tallies.write')
  save(
    @IdParam() id: number,
    @Body() body: SaveTallyDto,
    @Ctx() context: SignedInContext,
  ): Promise<TallyDetailDto> {
    return this.tallies.save(context, id, body);
  }

  @Post(':id/submit')
  @TallyWrite('tallies.write')
  @ApiHeader({
    name: 'Idempotency-Key',
    required: false,
    description: 'The same key again for this tally answers as the first submission did',
  })
  @ApiUnprocessableEntityResponse({ description: 'Checks fail; `fields` lists each problem' })
  submit(
    @IdParam() id: number,
    @Body() body: SubmitTallyDto,
    @Headers('idempotency-key') idempotencyKey: string | undefined,
    @Ctx() context: SignedInContext,
  ): Promise<TallyDetailDto> {
    return this.review.submit(context, id, body, idempotencyKey);
  }

  @Post(':id/approve')
  @TallyWrite('tallies.review')
  approve(
    @IdParam() id: number,
    @Body() body: ApproveTallyDto,
    @Ctx() context: SignedInContext,
  ): Promise<TallyDetailDto> {
    return this.review.approve(context, id, body);
  }

  @Post(':id/return')
  @TallyWrite('tallies.review')
  return(
    @IdParam() id: number,
    @Body() body: ReturnTallyDto,
    @Ctx() context: SignedInContext,
  ): Promise<TallyDetailDto> {
    return this.review.return(context, id, body);
  }

  @Post(':id/amend')
  @TallyWrite('tallies.write')
  amend(
    @IdParam() id: number,
    @Body() body: AmendTallyDto,
    @Ctx() context: SignedInContext,
  ): Promise<TallyDetailDto> {
    return this.review.amend(context, id, body);
  }
}

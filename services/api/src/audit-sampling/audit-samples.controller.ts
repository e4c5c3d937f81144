import { Body, Controller, Get, HttpCode, HttpStatus, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { IdParam } from '../common/pipes/id-param';
import { AuditSamplesService } from './audit-samples.service';
import { AuditSampleDto, AuditSamplePageDto, SamplePlanDto } from './dto/audit-sample-view.dto';
import { ListSamplesQuery } from './dto/list-samples.query';
import { DrawSampleRequestDto, SamplePlanRequestDto } from './dto/sample-plan-request.dto';

@ApiTags('audit samples')
@ApiBearerAuth()
@Controller('samples')
export class AuditSamplesController {
  constructor(private readonly samples: AuditSamplesService) {}

  @Post('plan')
  @Allow('audit.sample')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: SamplePlanDto, description: 'A preview: the population counted now' })
  plan(
    @Body() body: SamplePlanRequestDto,
    @Ctx() context: SignedInContext,
  ): Promise<SamplePlanDto> {
    return this.samples.plan(context.actor, body);
  }

  @Post()
  @Allow('audit.sample')
  @ApiCreatedResponse({
    type: AuditSampleDto,
    description: 'Drawn and stored, items in draw order',
  })
  draw(
    @Body() body: DrawSampleRequestDto,
    @Ctx() context: SignedInContext,
  ): Promise<AuditSampleDto> {
    return this.samples.draw(context, body);
  }

  @Get()
  @Allow('audit.read')
  @ApiOkResponse({ type: AuditSamplePageDto, description: 'Newest first' })
  list(
    @Query() query: ListSamplesQuery,
    @Ctx() context: SignedInContext,
  ): Promise<AuditSamplePageDto> {
    return this.samples.list(context.actor, query);
  }

  @Get(':id')
  @Allow('audit.read')
  @ApiOkResponse({ type: AuditSampleDto })
  get(@IdParam() id: number, @Ctx() context: SignedInContext): Promise<AuditSampleDto> {
    return this.samples.get(context.actor, id);
  }
}

import { Controller, Get, Param, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { TraceQuery } from './dto/trace.query';
import { TraceViewDto } from './dto/trace-view.dto';
import { TraceService } from './trace.service';

@ApiTags('trace')
@ApiBearerAuth()
@Controller('trace')
export class TraceController {
  constructor(private readonly traces: TraceService) {}

  @Get(':reference')
  // A trace lists tallies and receipts, not aggregates: grant writers (BRIEF §2, "aggregates
  // only") get a 403 from the guard, every other role reads it within its scope.
  @Allow('tallies.read')
  @ApiOkResponse({
    type: TraceViewDto,
    description: 'The figure, the approved tally revisions behind it, and the figure re-added',
  })
  @ApiBadRequestResponse({ description: 'A reference or measure that names no figure' })
  @ApiForbiddenResponse({ description: 'Grant writers: aggregates only' })
  @ApiNotFoundResponse({ description: 'Outside your scope, or no snapshot built' })
  trace(
    @Param('reference') reference: string,
    @Query() query: TraceQuery,
    @Ctx() context: SignedInContext,
  ): Promise<TraceViewDto> {
    return this.traces.trace(context.actor, reference, query);
  }
}

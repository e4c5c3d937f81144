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
  UseGuards,
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
import { ReceiptInputDto, UpdateReceiptDto } from './dto/receipt-input.dto';
import { ListReceiptsQuery } from './dto/list-receipts.query';
import { ReceiptDetailDto, ReceiptHistoryEntryDto, ReceiptPageDto } from './dto/receipt-view.dto';
import { ReceiptInScopeGuard } from './receipt-in-scope.guard';
import { ReceiptsService } from './receipts.service';

@ApiTags('receipts')
@ApiBearerAuth()
@Controller('receipts')
export class ReceiptsController {
  constructor(private readonly receipts: ReceiptsService) {}

  @Get()
  @Allow('receipts.read')
  @ApiOkResponse({ type: ReceiptPageDto })
  list(
    @Query() query: ListReceiptsQuery,
    @Ctx() context: SignedInContext,
  ): Promise<ReceiptPageDto> {
    return this.receipts.list(context.actor, query);
  }

  @Post()
  @Allow('receipts.write')
  @ApiCreatedResponse({ type: ReceiptDetailDto, description: 'Saved; see `warnings`' })
  create(
    @Body() body: ReceiptInputDto,
    @Ctx() context: SignedInContext,
  ): Promise<ReceiptDetailDto> {
    return this.receipts.create(context, body);
  }

  @Get(':id')
  @Allow('receipts.read')
  @ApiOkResponse({ type: ReceiptDetailDto })
  get(@IdParam() id: number, @Ctx() context: SignedInContext): Promise<ReceiptDetailDto> {
    return this.receipts.get(context.actor, id);
  }

  @Patch(':id')
  @Allow('receipts.write')
  @UseGuards(ReceiptInScopeGuard)
  @UseFilters(StaleVersionFilter)
  @ApiOkResponse({ type: ReceiptDetailDto })
  @ApiConflictResponse({ description: 'A newer version exists; the body carries it as `current`' })
  update(
    @IdParam() id: number,
    @Body() body: UpdateReceiptDto,
    @Ctx() context: SignedInContext,
  ): Promise<ReceiptDetailDto> {
    return this.receipts.update(context, id, body);
  }

  @Get(':id/history')
  @Allow('receipts.read')
  @ApiOkResponse({ type: [ReceiptHistoryEntryDto], description: 'Audit entries, oldest first' })
  history(
    @IdParam() id: number,
    @Ctx() context: SignedInContext,
  ): Promise<ReceiptHistoryEntryDto[]> {
    return this.receipts.history(context.actor, id);
  }

  @Post(':id/erase-sender')
  @Allow('senders.erase')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({
    type: ReceiptDetailDto,
    description: "The sender's details are gone; counts stay",
  })
  eraseSender(@IdParam() id: number, @Ctx() context: SignedInContext): Promise<ReceiptDetailDto> {
    return this.receipts.eraseSender(context, id);
  }
}

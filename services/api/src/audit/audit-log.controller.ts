import {
  Controller,
  Get,
  HttpCode,
  HttpStatus,
  Post,
  Query,
  Res,
  StreamableFile,
} from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { AuditChainVerifier } from './audit-chain-verifier.service';
import { AuditLogExport } from './audit-log-export.service';
import { AuditLogService } from './audit-log.service';
import { AuditLogPageDto, AuditVerificationDto } from './dto/audit-log-view.dto';
import { ListAuditLogQuery } from './dto/list-audit-log.query';

const XLSX_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

@ApiTags('audit log')
@ApiBearerAuth()
@Controller('audit-log')
export class AuditLogController {
  constructor(
    private readonly log: AuditLogService,
    private readonly verifier: AuditChainVerifier,
    private readonly exporter: AuditLogExport,
  ) {}

  @Get()
  @Allow('audit.read')
  @ApiOkResponse({ type: AuditLogPageDto, description: 'Newest first' })
  list(@Query() query: ListAuditLogQuery): Promise<AuditLogPageDto> {
    return this.log.list(query);
  }

  /** Read-only for the log itself; the run is recorded (and audited) so checks leave a trail. */
  @Post('verify')
  @Allow('audit.verify')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: AuditVerificationDto, description: 'Seals pending entries, then checks' })
  verify(@Ctx() context: SignedInContext): Promise<AuditVerificationDto> {
    return this.verifier.verify(context, 'request');
  }

  @Get('export')
  @Allow('audit.read')
  @ApiProduces(XLSX_TYPE)
  @ApiOkResponse({ description: 'The filtered log as an xlsx attachment, newest first' })
  async export(
    @Query() query: ListAuditLogQuery,
    @Ctx() context: SignedInContext,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    const file = await this.exporter.file(context, query);
    response.setHeader('Cache-Control', 'private, no-store');
    return new StreamableFile(file.stream, {
      type: XLSX_TYPE,
      disposition: `attachment; filename="${file.fileName}"`,
      length: file.sizeBytes,
    });
  }
}

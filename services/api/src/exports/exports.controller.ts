import {
  Body,
  Controller,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  ParseUUIDPipe,
  Post,
  Query,
  Res,
  StreamableFile,
} from '@nestjs/common';
import {
  ApiAcceptedResponse,
  ApiBearerAuth,
  ApiGoneResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { Response } from 'express';
import { Allow, Public } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import {
  FileLinkQuery,
  ImpactPackDto,
  ListExportsQuery,
  TableExportDto,
} from './dto/export-requests.dto';
import { ExportPageDto, ExportViewDto } from './dto/export-view.dto';
import { ExportsService } from './exports.service';

/** Any text that is not a UUID is simply an export that does not exist. */
const ExportId = () =>
  Param('id', new ParseUUIDPipe({ errorHttpStatusCode: HttpStatus.NOT_FOUND }));

@ApiTags('exports')
@Controller('exports')
export class ExportsController {
  constructor(private readonly exports: ExportsService) {}

  @Post()
  @ApiBearerAuth()
  @Allow('exports.tables')
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiAcceptedResponse({ type: ExportViewDto, description: 'Queued; poll it until done' })
  requestTable(
    @Body() body: TableExportDto,
    @Ctx() context: SignedInContext,
  ): Promise<ExportViewDto> {
    return this.exports.requestTable(context, body);
  }

  @Post('impact-pack')
  @ApiBearerAuth()
  @Allow('exports.impact-pack')
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiAcceptedResponse({ type: ExportViewDto, description: 'Queued; poll it until done' })
  requestImpactPack(
    @Body() body: ImpactPackDto,
    @Ctx() context: SignedInContext,
  ): Promise<ExportViewDto> {
    return this.exports.requestImpactPack(context, body);
  }

  @Get()
  @ApiBearerAuth()
  @Allow('exports.tables')
  @ApiOkResponse({ type: ExportPageDto, description: 'Your own exports, newest first' })
  list(@Query() query: ListExportsQuery, @Ctx() context: SignedInContext): Promise<ExportPageDto> {
    return this.exports.list(context.actor, query);
  }

  @Get(':id')
  @ApiBearerAuth()
  @Allow('exports.tables')
  @ApiOkResponse({ type: ExportViewDto })
  get(@ExportId() id: string, @Ctx() context: SignedInContext): Promise<ExportViewDto> {
    return this.exports.get(context.actor, id);
  }

  /** Public: the browser follows a plain link, so the signature stands in for the sign-in. */
  @Get(':id/file')
  @Public()
  @ApiOkResponse({ description: 'The file, as an attachment' })
  @ApiGoneResponse({ description: 'The link has expired' })
  async file(
    @ExportId() id: string,
    @Query() query: FileLinkQuery,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    const file = await this.exports.file(id, query.expires, query.signature);
    response.setHeader('Cache-Control', 'private, no-store');
    return new StreamableFile(file.stream, {
      type: file.contentType,
      disposition: `attachment; filename="${file.fileName}"`,
      length: file.sizeBytes ?? undefined,
    });
  }
}

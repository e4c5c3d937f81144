import { Body, Controller, Get, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { IdParam } from '../common/pipes/id-param';
import { ChaptersService } from './chapters.service';
import { ChapterDto } from './dto/chapter.dto';
import { ListChaptersQuery } from './dto/list-chapters.query';
import { SaveChapterDto, UpdateChapterDto } from './dto/save-chapter.dto';

@ApiTags('network')
@ApiBearerAuth()
@Controller('chapters')
@Allow('network.read')
export class ChaptersController {
  constructor(private readonly chapters: ChaptersService) {}

  @Get()
  @ApiOkResponse({ type: [ChapterDto], description: 'Chapters in your scope, by region and name' })
  list(@Query() query: ListChaptersQuery, @Ctx() context: SignedInContext): Promise<ChapterDto[]> {
    return this.chapters.list(context.actor, query);
  }

  @Get(':id')
  @ApiOkResponse({ type: ChapterDto })
  get(@IdParam() id: number, @Ctx() context: SignedInContext): Promise<ChapterDto> {
    return this.chapters.get(context.actor, id);
  }

  @Post()
  @Allow('network.manage')
  @ApiCreatedResponse({ type: ChapterDto, description: 'Created; the name is unique (409)' })
  create(@Body() body: SaveChapterDto, @Ctx() context: SignedInContext): Promise<ChapterDto> {
    return this.chapters.create(context, body);
  }

  @Patch(':id')
  @Allow('network.manage')
  @ApiOkResponse({ type: ChapterDto, description: 'Changes only the fields sent' })
  update(
    @IdParam() id: number,
    @Body() body: UpdateChapterDto,
    @Ctx() context: SignedInContext,
  ): Promise<ChapterDto> {
    return this.chapters.update(context, id, body);
  }
}

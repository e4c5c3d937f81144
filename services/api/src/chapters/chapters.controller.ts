import { Controller, Get, Query } from '@nestjs/common';
import { ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { ChaptersService } from './chapters.service';
import { ChapterDto } from './dto/chapter.dto';
import { ListChaptersQuery } from './dto/list-chapters.query';

@ApiTags('network')
@Controller('chapters')
export class ChaptersController {
  constructor(private readonly chapters: ChaptersService) {}

  @Get()
  @ApiOkResponse({ type: [ChapterDto], description: 'Chapters by region and name' })
  list(@Query() query: ListChaptersQuery): Promise<ChapterDto[]> {
    return this.chapters.list(query);
  }
}

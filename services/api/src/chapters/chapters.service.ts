import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Actor } from '../common/access/actor';
import { chapterScope, within } from '../common/access/scope';
import { Region } from '../regions/models/region.model';
import type { ChapterDto } from './dto/chapter.dto';
import type { ListChaptersQuery } from './dto/list-chapters.query';
import { Chapter } from './models/chapter.model';

@Injectable()
export class ChaptersService {
  constructor(@InjectModel(Chapter) private readonly chapters: typeof Chapter) {}

  /** Chapters in the person's scope; a region filter outside scope simply finds nothing. */
  async list(actor: Actor, query: ListChaptersQuery): Promise<ChapterDto[]> {
    const rows = await this.chapters.findAll({
      where: within(chapterScope(actor), query.regionId ? { regionId: query.regionId } : {}),
      include: [{ model: Region, attributes: ['name'] }],
      order: [
        [{ model: Region, as: 'region' }, 'name', 'ASC'],
        ['name', 'ASC'],
      ],
    });
    return rows.map(toChapterDto);
  }

  async get(actor: Actor, id: number): Promise<ChapterDto> {
    const row = await this.chapters.findOne({
      where: within(chapterScope(actor), { id }),
      include: [{ model: Region, attributes: ['name'] }],
    });
    if (!row) throw new NotFoundException('No such chapter.');
    return toChapterDto(row);
  }
}

function toChapterDto(chapter: Chapter): ChapterDto {
  return {
    id: chapter.id,
    name: chapter.name,
    regionId: chapter.regionId,
    regionName: chapter.region?.name ?? '',
    reportingDueDay: chapter.reportingDueDay,
    activeFrom: chapter.activeFrom,
    activeTo: chapter.activeTo ?? null,
  };
}

import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Region } from '../regions/models/region.model';
import type { ChapterDto } from './dto/chapter.dto';
import type { ListChaptersQuery } from './dto/list-chapters.query';
import { Chapter } from './models/chapter.model';

@Injectable()
export class ChaptersService {
  constructor(@InjectModel(Chapter) private readonly chapters: typeof Chapter) {}

  async list(query: ListChaptersQuery): Promise<ChapterDto[]> {
    const rows = await this.chapters.findAll({
      where: query.regionId ? { regionId: query.regionId } : {},
      include: [{ model: Region, attributes: ['name'] }],
      order: [
        [{ model: Region, as: 'region' }, 'name', 'ASC'],
        ['name', 'ASC'],
      ],
    });
    return rows.map(toChapterDto);
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

import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { fn, col } from 'sequelize';
import { Chapter } from '../chapters/models/chapter.model';
import type { RegionDto } from './dto/region.dto';
import { Region } from './models/region.model';

@Injectable()
export class RegionsService {
  constructor(@InjectModel(Region) private readonly regions: typeof Region) {}

  async list(): Promise<RegionDto[]> {
    const rows = await this.regions.findAll({
      attributes: ['id', 'name', 'code', [fn('COUNT', col('chapters.id')), 'chapterCount']],
      include: [{ model: Chapter, attributes: [] }],
      group: ['Region.id'],
      order: [['name', 'ASC']],
    });
    return rows.map((row) => toRegionDto(row, Number(row.get('chapterCount'))));
  }
}

function toRegionDto(region: Region, chapterCount: number): RegionDto {
  return { id: region.id, name: region.name, code: region.code, chapterCount };
}

import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { col, fn } from 'sequelize';
import { Chapter } from '../chapters/models/chapter.model';
import type { Actor } from '../common/access/actor';
import { regionScope, within } from '../common/access/scope';
import type { RegionDto } from './dto/region.dto';
import { Region } from './models/region.model';

@Injectable()
export class RegionsService {
  constructor(@InjectModel(Region) private readonly regions: typeof Region) {}

  /** The regions the person may see, by name, with their chapter counts. */
  async list(actor: Actor): Promise<RegionDto[]> {
    const rows = await this.regions.findAll({
      attributes: ['id', 'name', 'code', [fn('COUNT', col('chapters.id')), 'chapterCount']],
      where: regionScope(actor),
      include: [{ model: Chapter, attributes: [] }],
      group: ['Region.id'],
      order: [['name', 'ASC']],
    });
    return rows.map((row) => toRegionDto(row, Number(row.get('chapterCount'))));
  }

  /** One region in scope; out of scope is reported exactly like a region that does not exist. */
  async get(actor: Actor, id: number): Promise<RegionDto> {
    const row = await this.regions.findOne({
      attributes: ['id', 'name', 'code', [fn('COUNT', col('chapters.id')), 'chapterCount']],
      where: within(regionScope(actor), { id }),
      include: [{ model: Chapter, attributes: [] }],
      group: ['Region.id'],
      // findOne adds LIMIT 1; without this Sequelize would push it into a subquery the COUNT cannot see.
      subQuery: false,
    });
    if (!row) throw new NotFoundException('No such region.');
    return toRegionDto(row, Number(row.get('chapterCount')));
  }
}

function toRegionDto(region: Region, chapterCount: number): RegionDto {
  return { id: region.id, name: region.name, code: region.code, chapterCount };
}

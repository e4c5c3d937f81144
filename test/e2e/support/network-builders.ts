import type { INestApplication } from '@nestjs/common';
import { getModelToken } from '@nestjs/sequelize';
import { Chapter } from '../../../services/api/src/chapters/models/chapter.model';
import { Region } from '../../../services/api/src/regions/models/region.model';
import { uniqueSuffix } from './test-app';

/** Builds a region (and optionally its chapters) that belongs to one test. */
export function aRegion() {
  const suffix = uniqueSuffix();
  let name = `Test Region ${suffix}`;
  let code = suffix.slice(-8);
  const chapters: Array<{ name: string; activeFrom: string; reportingDueDay: number }> = [];
  const builder = {
    named(value: string) {
      name = `${value} ${suffix}`;
      return builder;
    },
    withCode(value: string) {
      code = value;
      return builder;
    },
    withChapter(chapterName: string, activeFrom = '2024-01-01', reportingDueDay = 10) {
      chapters.push({ name: `${chapterName} ${suffix}`, activeFrom, reportingDueDay });
      return builder;
    },
    async build(app: INestApplication): Promise<{ region: Region; chapters: Chapter[] }> {
      const regions = app.get<typeof Region>(getModelToken(Region));
      const chapterModel = app.get<typeof Chapter>(getModelToken(Chapter));
      const region = await regions.create({ name, code });
      const created: Chapter[] = [];
      for (const chapter of chapters) {
        created.push(await chapterModel.create({ ...chapter, regionId: region.id }));
      }
      return { region, chapters: created };
    },
  };
  return builder;
}

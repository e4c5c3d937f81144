import { QueryTypes, type Sequelize } from 'sequelize';
import { DEMO_REGIONS } from './demo-scenario';

export interface SeedOutcome {
  seeded: boolean;
  regions: number;
  chapters: number;
}

/** Loads the demo network into an empty database; leaves a database that has data alone. */
export async function seedDemo(sequelize: Sequelize): Promise<SeedOutcome> {
  const [{ count }] = await sequelize.query<{ count: number }>(
    'SELECT COUNT(*) AS count FROM regions',
    {
      type: QueryTypes.SELECT,
    },
  );
  if (Number(count) > 0) return { seeded: false, regions: 0, chapters: 0 };

  let chapters = 0;
  await sequelize.transaction(async (transaction) => {
    const qi = sequelize.getQueryInterface();
    for (const region of DEMO_REGIONS) {
      await qi.bulkInsert('regions', [{ name: region.name, code: region.code }], { transaction });
      const [{ id }] = await sequelize.query<{ id: number }>(
        'SELECT id FROM regions WHERE code = ?',
        {
          replacements: [region.code],
          type: QueryTypes.SELECT,
          transaction,
        },
      );
      await qi.bulkInsert(
        'chapters',
        region.chapters.map((chapter) => ({
          region_id: id,
          name: chapter.name,
          reporting_due_day: chapter.reportingDueDay,
          active_from: chapter.activeFrom,
          active_to: chapter.activeTo ?? null,
        })),
        { transaction },
      );
      chapters += region.chapters.length;
    }
  });
  return { seeded: true, regions: DEMO_REGIONS.length, chapters };
}

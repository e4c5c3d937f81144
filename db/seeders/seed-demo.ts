import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { hashPassword } from '../../services/api/src/auth/passwords/password-hasher';
import { DEMO_REGIONS } from './demo-scenario';
import { DEMO_SIGN_INS } from './demo-sign-ins';
import { seedNetworkSetup } from './seed-network-setup';
import { seedReceipts } from './seed-receipts';

export interface SeedOutcome {
  seeded: boolean;
  regions: number;
  chapters: number;
  people: number;
}

async function idOf(
  sequelize: Sequelize,
  transaction: Transaction,
  sql: string,
  value: string,
): Promise<number> {
  const [row] = await sequelize.query<{ id: number }>(sql, {
    replacements: [value],
    type: QueryTypes.SELECT,
    transaction,
  });
  if (!row) throw new Error(`demo seed: nothing found for ${value}`);
  return row.id;
}

/** Loads the demo network into an empty database; leaves a database that has data alone. */
export async function seedDemo(sequelize: Sequelize): Promise<SeedOutcome> {
  const [{ count }] = await sequelize.query<{ count: number }>(
    'SELECT COUNT(*) AS count FROM regions',
    {
      type: QueryTypes.SELECT,
    },
  );
  if (Number(count) > 0) return { seeded: false, regions: 0, chapters: 0, people: 0 };

  const hashes = await Promise.all(DEMO_SIGN_INS.map((person) => hashPassword(person.password)));
  let chapters = 0;
  await sequelize.transaction(async (transaction) => {
    const qi = sequelize.getQueryInterface();
    for (const region of DEMO_REGIONS) {
      await qi.bulkInsert('regions', [{ name: region.name, code: region.code }], { transaction });
      const regionId = await idOf(
        sequelize,
        transaction,
        'SELECT id FROM regions WHERE code = ?',
        region.code,
      );
      await qi.bulkInsert(
        'chapters',
        region.chapters.map((chapter) => ({
          region_id: regionId,
          name: chapter.name,
          reporting_due_day: chapter.reportingDueDay,
          active_from: chapter.activeFrom,
          active_to: chapter.activeTo ?? null,
        })),
        { transaction },
      );
      chapters += region.chapters.length;
    }

    const now = new Date();
    const people = [];
    for (const [index, person] of DEMO_SIGN_INS.entries()) {
      people.push({
        email: person.email,
        display_name: person.displayName,
        password_hash: hashes[index],
        role: person.role,
        region_id: person.regionCode
          ? await idOf(
              sequelize,
              transaction,
              'SELECT id FROM regions WHERE code = ?',
              person.regionCode,
            )
          : null,
        chapter_id: person.chapterName
          ? await idOf(
              sequelize,
              transaction,
              'SELECT id FROM chapters WHERE name = ?',
              person.chapterName,
            )
          : null,
        active: true,
        invited_at: now,
        password_changed_at: now,
      });
    }
    await qi.bulkInsert('users', people, { transaction });
    await seedNetworkSetup(sequelize, transaction);
  });
  // Receipts come in their own transactions: two years of parcels is a lot of rows.
  await seedReceipts(sequelize);
  return { seeded: true, regions: DEMO_REGIONS.length, chapters, people: DEMO_SIGN_INS.length };
}

import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { hashPassword } from '../../services/api/src/auth/passwords/password-hasher';
import { DEMO_REGIONS } from './demo-scenario';
import { DEMO_SIGN_INS } from './demo-sign-ins';
import { seedNetworkSetup } from './seed-network-setup';
import { seedReceipts } from './seed-receipts';
import { seedTallies } from './seed-tallies';

export interface SeedOutcome {
  /** What was loaded this time, e.g. ["network and people", "parcel receipts"]; empty when nothing. */
  parts: string[];
}

async function isEmpty(sequelize: Sequelize, table: string): Promise<boolean> {
  const [{ count }] = await sequelize.query<{ count: number }>(
    `SELECT COUNT(*) AS count FROM \`${table}\``,
    {
      type: QueryTypes.SELECT,
    },
  );
  return Number(count) === 0;
}

/** True when the regions in the database are the demo network's, so demo parts may be added to it. */
async function holdsDemoNetwork(sequelize: Sequelize): Promise<boolean> {
  const rows = await sequelize.query<{ code: string }>('SELECT code FROM regions', {
    type: QueryTypes.SELECT,
  });
  const codes = new Set(rows.map((row) => row.code));
  return DEMO_REGIONS.every((region) => codes.has(region.code));
}

/**
 * Loads the demo scenario part by part, each only while its own tables are empty: a new database
 * gets everything, and a demo database made by an older version gets the parts added since.
 * A database holding a real network is never touched.
 */
export async function seedDemo(sequelize: Sequelize): Promise<SeedOutcome> {
  const parts: string[] = [];
  if (await isEmpty(sequelize, 'regions')) {
    await seedNetwork(sequelize);
    parts.push('regions and chapters');
  }
  if (!(await holdsDemoNetwork(sequelize))) return { parts };
  if (await isEmpty(sequelize, 'users')) {
    await seedPeople(sequelize);
    parts.push('demo sign-ins');
  }
  if (await isEmpty(sequelize, 'blanket_sizes')) {
    await sequelize.transaction((transaction) => seedNetworkSetup(sequelize, transaction));
    parts.push('agencies, campaigns, blanket sizes and settings');
  }
  if (await isEmpty(sequelize, 'parcel_receipts')) {
    // In its own transactions: two years of parcels is a lot of rows.
    await seedReceipts(sequelize);
    parts.push('parcel receipts');
  }
  if (await isEmpty(sequelize, 'monthly_tallies')) {
    // After the receipts: the tallies' figures follow them.
    await seedTallies(sequelize);
    parts.push('monthly tallies');
  }
  return { parts };
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

async function seedNetwork(sequelize: Sequelize): Promise<void> {
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
    }
  });
}

async function seedPeople(sequelize: Sequelize): Promise<void> {
  const hashes = await Promise.all(DEMO_SIGN_INS.map((person) => hashPassword(person.password)));
  await sequelize.transaction(async (transaction) => {
    const qi = sequelize.getQueryInterface();
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
  });
}

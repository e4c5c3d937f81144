import { QueryTypes, Sequelize } from 'sequelize';

/** The API's account gets table rights from migrations, nothing more; the owner's account runs migrations. */
describe("the application's database account", () => {
  let asApp: Sequelize;
  beforeAll(() => {
    asApp = new Sequelize(process.env.DATABASE_URL!, { dialect: 'mariadb', logging: false });
  });
  afterAll(() => asApp.close());

  it('is not the schema owner', () => {
    const app = new URL(process.env.DATABASE_URL!).username;
    const owner = new URL(process.env.DATABASE_MIGRATION_URL!).username;
    expect(app).not.toBe(owner);
  });

  it('may read the network tables', async () => {
    const [row] = await asApp.query<{ n: number }>('SELECT COUNT(*) AS n FROM regions', {
      type: QueryTypes.SELECT,
    });
    expect(Number(row.n)).toBeGreaterThan(0);
  });

  it('may not change the schema or read the migration ledger', async () => {
    await expect(asApp.query('DROP TABLE chapters')).rejects.toThrow(/denied/i);
    await expect(asApp.query('ALTER TABLE regions ADD COLUMN sneaky INT')).rejects.toThrow(
      /denied/i,
    );
    await expect(
      asApp.query('SELECT * FROM schema_migrations', { type: QueryTypes.SELECT }),
    ).rejects.toThrow(/denied/i);
  });
});

import type { Sequelize, Transaction } from 'sequelize';

const BATCH_SIZE = 400;

/** Inserts many rows a few hundred at a time, so no single statement grows too large. */
export async function inBatches(
  sequelize: Sequelize,
  table: string,
  rows: object[],
  transaction: Transaction,
): Promise<void> {
  for (let start = 0; start < rows.length; start += BATCH_SIZE) {
    await sequelize
      .getQueryInterface()
      .bulkInsert(table, rows.slice(start, start + BATCH_SIZE), { transaction });
  }
}

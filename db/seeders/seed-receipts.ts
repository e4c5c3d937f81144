import type { Sequelize } from 'sequelize';

/** Two years of parcel receipts for the demo network, some with generated scans. */
export async function seedReceipts(_sequelize: Sequelize): Promise<void> {
  // Filled in with the parcel receipts work.
}

import type { Sequelize, Transaction } from 'sequelize';

/** Partner agencies, the demo campaign, the blanket size catalogue and settings. */
export async function seedNetworkSetup(
  _sequelize: Sequelize,
  _transaction: Transaction,
): Promise<void> {
  // Filled in with the network set-up work.
}

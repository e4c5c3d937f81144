import type { QueryInterface, Sequelize } from 'sequelize';
import type { AppAccount } from '../connection';

export interface MigrationContext {
  sequelize: Sequelize;
  queryInterface: QueryInterface;
  /** The API's own account, or null when the API connects as the owner. */
  appAccount: AppAccount | null;
}

export interface Migration {
  name: string;
  up(context: MigrationContext): Promise<void>;
  down(context: MigrationContext): Promise<void>;
}

export type TablePrivilege = 'SELECT' | 'INSERT' | 'UPDATE' | 'DELETE';

/**
 * Gives the API's account exactly the rights it needs on one table. Every migration that creates
 * a table calls this, so a table the API must not change (the audit log) simply gets fewer rights.
 */
export async function grantToApp(
  context: MigrationContext,
  table: string,
  privileges: TablePrivilege[] = ['SELECT', 'INSERT', 'UPDATE', 'DELETE'],
): Promise<void> {
  if (!context.appAccount) return;
  const database = context.sequelize.getDatabaseName();
  for (const host of context.appAccount.hosts) {
    const account = `${context.sequelize.escape(context.appAccount.user)}@${context.sequelize.escape(host)}`;
    await context.sequelize.query(
      `GRANT ${privileges.join(', ')} ON \`${database}\`.\`${table}\` TO ${account}`,
    );
  }
}

import { Sequelize } from 'sequelize';

/** A Sequelize connection for migrations and seeds (the schema owner's account). */
export function connectAsOwner(): Sequelize {
  const url = process.env.DATABASE_MIGRATION_URL ?? process.env.DATABASE_URL;
  if (!url) {
    throw new Error(
      'Set DATABASE_URL (and optionally DATABASE_MIGRATION_URL) before running migrations or seeds.',
    );
  }
  return new Sequelize(url, { dialect: 'mariadb', logging: false, timezone: '+00:00' });
}

/** The account the API connects with, when it differs from the owner: migrations grant it table rights. */
export interface AppAccount {
  user: string;
  hosts: string[];
}

export function appAccountFromEnv(): AppAccount | null {
  const appUrl = process.env.DATABASE_URL;
  const ownerUrl = process.env.DATABASE_MIGRATION_URL;
  if (!appUrl || !ownerUrl) return null;
  const app = decodeURIComponent(new URL(appUrl).username);
  const owner = decodeURIComponent(new URL(ownerUrl).username);
  if (!app || app === owner) return null;
  const hosts = (process.env.DATABASE_APP_HOSTS ?? '%')
    .split(',')
    .map((h) => h.trim())
    .filter(Boolean);
  return { user: app, hosts };
}

import type { SqlQuery } from '@tallyloom/reports';
import type { Connection } from 'mariadb';
import type { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';

type Row = Record<string, unknown>;

/**
 * The MariaDB connection a Sequelize transaction runs on. A full rebuild reads tens of thousands
 * of rows and writes megabytes of JSON; through Sequelize every value of every row passes a
 * JavaScript type-cast hook and every written value its JavaScript escaping, which cost more
 * than the SQL itself. These two helpers talk to the driver directly, on the same connection,
 * so they stay inside the transaction.
 */
function driverOf(transaction: Transaction): Connection {
  const connection = (transaction as unknown as { connection?: Connection }).connection;
  if (!connection) throw new Error('the transaction has no connection yet');
  return connection;
}

/**
 * Rows of a query of the report definitions, as the driver decodes them: numbers as numbers,
 * DECIMAL and SUM() results as text (the readers use Number()), dates as the SQL formats them.
 */
export async function selectRows(transaction: Transaction, query: SqlQuery): Promise<Row[]> {
  return rowsOn(driverOf(transaction), query);
}

function rowsOn(connection: Connection, query: SqlQuery): Promise<Row[]> {
  // typeCast undefined: the driver's own decoders instead of Sequelize's hook.
  return connection.query<Row[]>(
    { sql: query.sql, namedPlaceholders: true, typeCast: undefined },
    query.replacements,
  );
}

/**
 * `selectRows` outside any transaction, on a connection of Sequelize's pool held for this one
 * statement: reads that do not depend on each other then run side by side.
 */
export async function pooledRows(sequelize: Sequelize, query: SqlQuery): Promise<Row[]> {
  const manager = sequelize.connectionManager;
  const connection = (await manager.getConnection({ type: 'read' })) as Connection;
  try {
    return await rowsOn(connection, query);
  } finally {
    manager.releaseConnection(connection);
  }
}

/** One statement that returns no rows, in autocommit, on a connection of Sequelize's pool. */
export async function pooledExecute(
  sequelize: Sequelize,
  sql: string,
  values: unknown[],
): Promise<void> {
  const manager = sequelize.connectionManager;
  const connection = (await manager.getConnection({ type: 'write' })) as Connection;
  try {
    await connection.query(sql, values);
  } finally {
    manager.releaseConnection(connection);
  }
}

/** Runs one statement for many rows of values in the driver's bulk protocol. */
export async function batchRows(
  transaction: Transaction,
  sql: string,
  rows: unknown[][],
): Promise<void> {
  if (rows.length === 0) return;
  await driverOf(transaction).batch(sql, rows);
}

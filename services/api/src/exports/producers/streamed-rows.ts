import type { Connection } from 'mariadb';
import { Utils, type Model, type ModelStatic, type WhereOptions } from 'sequelize';

/** The one method of Sequelize's query generator used here (typed `unknown` by Sequelize). */
interface WhereGenerator {
  whereQuery(where: WhereOptions, options: { model: ModelStatic<Model>; prefix: string }): string;
}

/**
 * A `where` over `model` as SQL, written by Sequelize exactly as its `findAll` writes it: the
 * model's own table aliased as the model's name, included models by their `as`, attributes mapped
 * to their columns. A streamed read then keeps the list's filters and scope without a second copy.
 */
export function whereSql(model: ModelStatic<Model>, where: WhereOptions): string {
  const generator = model.sequelize!.getQueryInterface().queryGenerator as WhereGenerator;
  return generator.whereQuery(Utils.mapWhereFieldNames(where, model) as WhereOptions, {
    model,
    prefix: model.name,
  });
}

/** A column of `model` in SQL, through its alias: `ParcelReceipt`.`set_aside_hard_care`. */
export function columnSql(model: ModelStatic<Model>, attribute: string): string {
  const definition = model.getAttributes()[attribute];
  if (!definition) throw new Error(`${model.name} has no attribute ${attribute}`);
  return `\`${model.name}\`.\`${definition.field ?? attribute}\``;
}

export type StreamedCell = string | number | null;

/**
 * One query's rows, in its order, as arrays of cells in batches, read as a stream on a connection
 * of its own from Sequelize's pool: one sort on the server, however many rows, instead of a page
 * query per batch that sorts again. The driver pauses the socket while a batch is being written
 * (back-pressure), so memory holds about one batch. Dates come as 'YYYY-MM-DD' text, counts as
 * numbers, and the cells skip Sequelize's per-cell type parser.
 */
export async function* streamedRows(
  model: ModelStatic<Model>,
  sql: string,
  batchSize: number,
): AsyncGenerator<StreamedCell[][]> {
  const manager = model.sequelize!.connectionManager;
  const connection = (await manager.getConnection({ type: 'read' })) as Connection;
  let drained = false;
  try {
    const stream = connection.queryStream({
      sql,
      rowsAsArray: true,
      dateStrings: true,
      bigIntAsNumber: true,
      decimalAsNumber: true,
      typeCast: undefined,
    });
    let batch: StreamedCell[][] = [];
    for await (const row of stream) {
      batch.push(row as StreamedCell[]);
      if (batch.length === batchSize) {
        yield batch;
        batch = [];
      }
    }
    if (batch.length > 0) yield batch;
    drained = true;
  } finally {
    if (drained) {
      manager.releaseConnection(connection);
    } else {
      // Stopped early (a failed write): the server would go on sending the rest, so the
      // connection is closed instead of going back to the pool.
      connection.destroy();
      await manager.destroyConnection(connection);
    }
  }
}

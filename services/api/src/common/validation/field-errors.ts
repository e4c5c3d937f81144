import { BadRequestException, ConflictException } from '@nestjs/common';
import {
  Op,
  UniqueConstraintError,
  type Model,
  type ModelStatic,
  type Transaction,
  type WhereOptions,
} from 'sequelize';

/** A 400 that names the one field at fault, in the shape the validation pipe uses. */
export function invalidField(field: string, message: string): BadRequestException {
  return new BadRequestException({
    message: `Invalid input: ${field}`,
    fields: [{ field, messages: [message] }],
  });
}

/** A unique field and what to say when its value is taken. */
export interface Taken {
  field: string;
  message: string;
}

/** A 409 for a value that must be unique and is already taken. */
export function takenField(field: string, message: string): ConflictException {
  return new ConflictException({ message, fields: [{ field, messages: [message] }] });
}

/**
 * Turns a unique-index violation (two saves racing past the service's own check) into the same
 * 409 the check gives. `messages` maps each unique column (snake_case, as the index is named) to
 * its field and message; anything else is rethrown unchanged.
 */
export function asTakenField(error: unknown, messages: Record<string, Taken>): unknown {
  if (!(error instanceof UniqueConstraintError)) return error;
  const keys = Object.keys(error.fields ?? {});
  const columns = Object.keys(messages);
  const column =
    columns.find((name) => keys.some((key) => key === name || key.endsWith(`.${name}`))) ??
    (columns.length === 1 ? columns[0] : undefined);
  if (!column) return error;
  return takenField(messages[column].field, messages[column].message);
}

/**
 * Refuses (409) a value another row already holds. `exceptId` is the row being changed, which may
 * keep its own value. Runs inside the write's transaction; the unique index still decides races.
 */
export async function refuseIfTaken<M extends Model>(
  model: ModelStatic<M>,
  where: WhereOptions,
  exceptId: number | null,
  transaction: Transaction,
  taken: Taken,
): Promise<void> {
  const scope: WhereOptions =
    exceptId === null ? where : { [Op.and]: [where, { id: { [Op.ne]: exceptId } }] };
  if ((await model.count({ where: scope, transaction })) > 0) {
    throw takenField(taken.field, taken.message);
  }
}

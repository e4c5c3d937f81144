import { Op, where as whereOf, type literal, type WhereOptions } from 'sequelize';

export interface KeysetKey {
  /** The `where` key of the column (e.g. 'receivedOn', '$chapter.name$'), or an SQL expression. */
  column: string | ReturnType<typeof literal>;
  direction: 'ASC' | 'DESC';
  /** The value in the last row read; null only for a column that may be null. */
  value: unknown;
  /** The column may hold NULL (then it needs the NULL rules below). */
  nullable?: boolean;
}

/**
 * Rows after the last one read, in the order of `keys` (the last key unique): the next page of a
 * keyset read, which costs the same on page 1,000 as on page 1, unlike OFFSET.
 * NULLs sort as MariaDB sorts them: before every value, so first ascending and last descending.
 */
// Source: MariaDB Knowledge Base, "ORDER BY" (NULL values are treated as lower than any value).
export function after(keys: KeysetKey[]): WhereOptions {
  const next = {
    [Op.or]: keys.flatMap((key, index) => {
      const beyond = beyondOf(key);
      if (beyond === null) return [];
      return [{ [Op.and]: [...keys.slice(0, index).map(equalTo), beyond] }];
    }),
  };
  // The same rows, plus a plain bound on the first key that the optimizer can read as an index
  // range; without it MariaDB may scan the whole table for each page of an OR condition.
  const [first] = keys;
  if (!first || first.nullable || first.value === null) return next;
  const bound = first.direction === 'ASC' ? { [Op.gte]: first.value } : { [Op.lte]: first.value };
  return { [Op.and]: [condition(first.column, bound), next] };
}

function condition(column: KeysetKey['column'], test: object): WhereOptions {
  return typeof column === 'string' ? { [column]: test } : whereOf(column, test);
}

function equalTo(key: KeysetKey): WhereOptions {
  return condition(key.column, key.value === null ? { [Op.is]: null } : { [Op.eq]: key.value });
}

/** Strictly after the value in the key's direction; null when nothing can come after. */
function beyondOf(key: KeysetKey): WhereOptions | null {
  const { column, direction, value, nullable } = key;
  if (value === null) return direction === 'ASC' ? condition(column, { [Op.not]: null }) : null;
  if (direction === 'ASC') return condition(column, { [Op.gt]: value });
  if (!nullable) return condition(column, { [Op.lt]: value });
  return {
    [Op.or]: [condition(column, { [Op.lt]: value }), condition(column, { [Op.is]: null })],
  };
}

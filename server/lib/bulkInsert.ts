import { sql, type SQL } from 'drizzle-orm';

/**
 * A column for bulk writes: its SQL name, the PostgreSQL type its array is cast to, and optionally an
 * expression for the value (`$value` stands for the element), e.g. `$value::geometry` from text.
 */
export type BulkColumn = readonly [name: string, pgType: string, expression?: string];

/** Rows per statement: large enough to amortise the round trip, small enough to bound memory. */
const ROWS_PER_STATEMENT = 20_000;

interface Executor {
  execute(query: SQL): Promise<unknown>;
}

/**
 * INSERT … SELECT FROM unnest(arrays): one statement and one parameter per column, so 200,000 rows cost a
 * few statements instead of the bind-parameter limit's hundreds (drizzle's insert builder was ~10× slower).
 */
export async function bulkInsert(
  tx: Executor,
  table: string,
  columns: readonly BulkColumn[],
  rows: readonly (readonly unknown[])[],
  onChunk?: (done: number, total: number) => void,
): Promise<void> {
  for (let start = 0; start < rows.length; start += ROWS_PER_STATEMENT) {
    const chunk = rows.slice(start, start + ROWS_PER_STATEMENT);
    const arrays = columns.map((_, c) => chunk.map((r) => r[c] ?? null));
    const unnest = sql.join(
      columns.map(([, type], c) => sql`${sql.param(arrays[c])}::${sql.raw(type)}[]`),
      sql`, `,
    );
    const names = sql.join(
      columns.map(([name]) => sql.identifier(name)),
      sql`, `,
    );
    const aliases = sql.raw(columns.map((_, c) => `c${c}`).join(', '));
    const values = sql.raw(
      columns.map(([, , expression], c) => (expression ? expression.replaceAll('$value', `u.c${c}`) : `u.c${c}`)).join(', '),
    );
    await tx.execute(sql`INSERT INTO ${sql.identifier(table)} (${names}) SELECT ${values} FROM unnest(${unnest}) AS u(${aliases})`);
    onChunk?.(Math.min(rows.length, start + ROWS_PER_STATEMENT), rows.length);
  }
}

/** UPDATE … FROM unnest(ids, values): many rows' columns set in one statement. */
export async function bulkUpdate(
  tx: Executor,
  table: string,
  idColumn: BulkColumn,
  columns: readonly (readonly [name: string, pgType: string, expression?: string])[],
  rows: readonly (readonly unknown[])[],
): Promise<void> {
  for (let start = 0; start < rows.length; start += ROWS_PER_STATEMENT) {
    const chunk = rows.slice(start, start + ROWS_PER_STATEMENT);
    const all = [idColumn, ...columns] as const;
    const arrays = all.map((_, c) => chunk.map((r) => r[c] ?? null));
    const unnest = sql.join(
      all.map(([, type], c) => sql`${sql.param(arrays[c])}::${sql.raw(type)}[]`),
      sql`, `,
    );
    const aliases = sql.join(
      all.map((_, c) => sql.raw(`c${c}`)),
      sql`, `,
    );
    const sets = sql.join(
      columns.map(
        ([name, , expression], i) =>
          sql`${sql.identifier(name)} = ${sql.raw(expression ? expression.replaceAll('$value', `u.c${i + 1}`) : `u.c${i + 1}`)}`,
      ),
      sql`, `,
    );
    await tx.execute(
      sql`UPDATE ${sql.identifier(table)} AS t SET ${sets} FROM unnest(${unnest}) AS u(${aliases}) WHERE t.${sql.identifier(idColumn[0])} = u.c0`,
    );
  }
}

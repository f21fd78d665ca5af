// Bulk inserts for the seeded history: multi-row INSERTs written out as SQL text. Drizzle's query
// builder spends a few microseconds on every value it binds, which for the history's hundreds of
// thousands of values was most of the seeding time; the text is escaped by pg's escapeLiteral.
import { getTableColumns, getTableName, sql } from "drizzle-orm";
import type { PgTable } from "drizzle-orm/pg-core";
import pg from "pg";
import type { Database } from "../client.ts";

/** Rows per statement: large enough to amortise each round trip, small enough to parse quickly. */
const ROWS_PER_STATEMENT = 2000;

function literal(value: unknown): string {
  if (value === null) return "NULL";
  if (typeof value === "number") {
    if (!Number.isFinite(value)) throw new Error(`cannot store ${value}`);
    return String(value);
  }
  if (typeof value === "boolean") return value ? "TRUE" : "FALSE";
  if (typeof value === "string") return pg.escapeLiteral(value);
  throw new Error(`cannot write a ${typeof value} as SQL`);
}

/** Inserts the rows in statements of a few thousand; a column a row leaves out takes its default. */
export async function insertInBatches<T extends PgTable>(db: Pick<Database, "execute">, table: T, rows: readonly T["$inferInsert"][]): Promise<void> {
  if (rows.length === 0) return;
  const columns = Object.entries(getTableColumns(table));
  const head = `INSERT INTO "${getTableName(table)}" (${columns.map(([, c]) => `"${c.name}"`).join(", ")}) VALUES `;
  for (let i = 0; i < rows.length; i += ROWS_PER_STATEMENT) {
    const values = rows.slice(i, i + ROWS_PER_STATEMENT).map((row) => {
      const record = row as Record<string, unknown>;
      const cells = columns.map(([key, column]) => {
        const value = record[key];
        return value === undefined ? "DEFAULT" : value === null ? "NULL" : literal(column.mapToDriverValue(value));
      });
      return `(${cells.join(", ")})`;
    });
    await db.execute(sql.raw(head + values.join(", ")));
  }
}

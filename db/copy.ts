import { Readable } from "node:stream";
import { pipeline } from "node:stream/promises";
import type { Knex } from "knex";
import type { PoolClient } from "pg";
import { from as copyFrom } from "pg-copy-streams";

// Bulk loading with PostgreSQL's COPY (pg-copy-streams), over the connection of the
// transaction it belongs to, so that the rows commit or roll back with the rest of the
// change. Rows go in as COPY's text format: far cheaper than an INSERT of thousands of
// bind parameters, which Knex builds and PostgreSQL parses row by row.

const ESCAPES: Record<string, string> = { "\\": "\\\\", "\t": "\\t", "\n": "\\n", "\r": "\\r" };
const SPECIAL = /[\\\t\n\r]/;

/** A value as COPY's text format writes it: \N for null, objects as JSON, special characters escaped. */
function copyValue(value: unknown): string {
  if (value === null || value === undefined) return "\\N";
  const text = typeof value === "string" ? value : typeof value === "object" ? JSON.stringify(value) : String(value);
  return SPECIAL.test(text) ? text.replace(/[\\\t\n\r]/g, (c) => ESCAPES[c]) : text;
}

/** The rows as COPY text: one line a row, columns separated by tabs. */
export function copyText(rows: readonly (readonly unknown[])[]): string {
  const lines: string[] = new Array(rows.length + 1);
  for (let r = 0; r < rows.length; r++) lines[r] = rows[r].map(copyValue).join("\t");
  lines[rows.length] = "";
  return lines.join("\n");
}

/**
 * Loads rows into a table (typically a temporary one) with COPY FROM STDIN, inside the
 * transaction: a failure (a value the column refuses) fails the transaction, so nothing of
 * the change is left written.
 */
export async function copyRows(trx: Knex, table: string, columns: readonly string[], rows: readonly (readonly unknown[])[]): Promise<void> {
  if (!rows.length) return;
  if (!trx.isTransaction) throw new Error("copyRows runs inside a transaction");
  // A transaction's client hands out the one connection the transaction holds (and never releases it early).
  const connection = (await trx.client.acquireConnection()) as PoolClient;
  const quoted = (name: string) => `"${name.replace(/"/g, '""')}"`;
  const sink = connection.query(copyFrom(`COPY ${quoted(table)} (${columns.map(quoted).join(", ")}) FROM STDIN`));
  await pipeline(Readable.from([copyText(rows)]), sink);
}

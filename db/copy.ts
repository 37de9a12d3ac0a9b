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

/** Rows as COPY text, in pieces of some KB (a string or a Buffer of 100 KB or more would stay in memory until a full collection). */
export interface CopyText {
  pieces: string[];
}

const LINES_A_PIECE = 64;

/** The rows as COPY text: one line a row, columns separated by tabs. */
export function copyText(rows: readonly (readonly unknown[])[]): CopyText {
  const pieces: string[] = [];
  for (let start = 0; start < rows.length; start += LINES_A_PIECE) {
    const lines = rows.slice(start, start + LINES_A_PIECE).map((row) => row.map(copyValue).join("\t"));
    lines.push("");
    pieces.push(lines.join("\n"));
  }
  return { pieces };
}

/**
 * Loads rows into a table with COPY FROM STDIN, inside the transaction: a failure (a value
 * the column refuses) fails the transaction, so nothing of the change is left written.
 * The rows may come as their text made beforehand with {@link copyText}, so that a caller
 * writing several tables lets go of its rows before the first one is sent.
 */
export async function copyRows(trx: Knex, table: string, columns: readonly string[], rows: readonly (readonly unknown[])[] | CopyText): Promise<void> {
  const { pieces } = "pieces" in rows ? rows : copyText(rows);
  if (!pieces.length) return;
  if (!trx.isTransaction) throw new Error("copyRows runs inside a transaction");
  // A transaction's client hands out the one connection the transaction holds (and never releases it early).
  const connection = (await trx.client.acquireConnection()) as PoolClient;
  const quoted = (name: string) => `"${name.replace(/"/g, '""')}"`;
  const sink = connection.query(copyFrom(`COPY ${quoted(table)} (${columns.map(quoted).join(", ")}) FROM STDIN`));
  await pipeline(Readable.from(pieces), sink);
}

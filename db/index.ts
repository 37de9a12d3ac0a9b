// The one place that opens database connections. Knex for every query; the raw pg pool
// exists only because lucia's PostgreSQL adapter asks for one.
import knexFactory, { type Knex } from "knex";
import pg from "pg";
import knexConfig, { databaseUrl } from "../knexfile";

const globalForDb = globalThis as typeof globalThis & { linkyardKnex?: Knex; linkyardPool?: pg.Pool };

export const db: Knex = globalForDb.linkyardKnex ?? knexFactory(knexConfig);
export const pool: pg.Pool =
  globalForDb.linkyardPool ?? new pg.Pool({ connectionString: databaseUrl, max: 5 });

if (process.env.NODE_ENV !== "production") {
  globalForDb.linkyardKnex = db;
  globalForDb.linkyardPool = pool;
}

/** A transaction (or the pool itself) that query functions run in. */
export type Tx = Knex;

/** Runs work in a transaction that is always rolled back: reads that may use temporary tables, writing nothing. */
export async function rolledBack<T>(work: (tx: Knex.Transaction) => Promise<T>): Promise<T> {
  const tx = await db.transaction();
  try {
    return await work(tx);
  } finally {
    await tx.rollback();
  }
}

/** Whether the database answers (the health check). */
export async function ping(): Promise<void> {
  await db.raw("select 1");
}

// The one place that opens database connections. Knex for every query; the raw pg pool
// exists only because lucia's PostgreSQL adapter asks for one.
import knexFactory, { type Knex } from "knex";
import pg from "pg";
import knexConfig, { databaseUrl } from "../knexfile";

const globalForDb = globalThis as typeof globalThis & { linkyardKnex?: Knex; linkyardPool?: pg.Pool };

// Bounded waits, so that a database that is down or hung gives a 503 within seconds instead
// of a request that hangs (lib/http/unavailable.ts): a connection is made in 3 s or not at
// all, the pool hands one out in 5 s, and a statement runs for at most 30 s. A connection
// lost while PostgreSQL was away is dropped from the pool, and new ones are made when it is back.
const TIMEOUTS = { connectionTimeoutMillis: 3_000, statement_timeout: 30_000, query_timeout: 35_000 };

export const db: Knex =
  globalForDb.linkyardKnex ??
  knexFactory({ ...knexConfig, connection: { connectionString: databaseUrl, ...TIMEOUTS }, acquireConnectionTimeout: 5_000 });
export const pool: pg.Pool = globalForDb.linkyardPool ?? newPool();

function newPool(): pg.Pool {
  const p = new pg.Pool({ connectionString: databaseUrl, max: 5, ...TIMEOUTS });
  // An idle client whose server went away emits "error"; unheard, it would end the process.
  p.on("error", (error) => console.error(`database connection lost: ${error.message}`));
  return p;
}

// Once per process: Next bundles proxy.ts apart from the pages and routes, and the dev server
// reloads modules; both would otherwise open pools of their own.
globalForDb.linkyardKnex = db;
globalForDb.linkyardPool = pool;

/**
 * The first row of a hot read (the session of every signed-in request, the scan's lookup by
 * tag code) keyed by its first binding, as a named prepared statement: PostgreSQL parses and
 * plans it once per pooled connection instead of on every call, and the call skips Knex's
 * query building. The SQL still comes from Knex's builder, once; the connection from Knex's pool.
 */
export function preparedFirst<R>(name: string, query: Knex.QueryBuilder): (key: string) => Promise<R | undefined> {
  const { sql, bindings } = query.toSQL().toNative();
  return async (key) => {
    const connection: pg.PoolClient = await db.client.acquireConnection();
    try {
      const { rows } = await connection.query<R & pg.QueryResultRow>({ name, text: sql, values: [key, ...bindings.slice(1)] });
      return rows[0];
    } finally {
      await db.client.releaseConnection(connection);
    }
  };
}

/** A transaction (or the pool itself) that query functions run in. */
export type Tx = Knex;

/**
 * Runs work in one transaction that writes no audit row: the worker's own bookkeeping
 * (sending a queued e-mail, the daily run). A person's change goes through `audited()`.
 */
export function inTransaction<T>(work: (tx: Tx) => Promise<T>): Promise<T> {
  return db.transaction(work);
}

/** Whether the database answers (the health check). */
export async function ping(): Promise<void> {
  await db.raw("select 1");
}

// The one place that opens database connections. Knex for every query; the raw pg pool
// exists only because lucia's PostgreSQL adapter asks for one.
import knexFactory, { type Knex } from "knex";
import pg from "pg";
import knexConfig from "../knexfile";
import { config } from "../lib/config";

const globalForDb = globalThis as unknown as { linkyardKnex?: Knex; linkyardPool?: pg.Pool };

export const db: Knex = globalForDb.linkyardKnex ?? knexFactory(knexConfig);
export const pool: pg.Pool =
  globalForDb.linkyardPool ?? new pg.Pool({ connectionString: config.DATABASE_URL, max: 5 });

if (process.env.NODE_ENV !== "production") {
  globalForDb.linkyardKnex = db;
  globalForDb.linkyardPool = pool;
}

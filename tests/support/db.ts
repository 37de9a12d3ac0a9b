import knex from "knex";
import knexConfig from "../../knexfile";

/** Direct database access for assertions (scripts/test.sh points DATABASE_URL at the test database). */
export const testDb = knex({ ...knexConfig, pool: { min: 0, max: 2 } });

export async function countRows(table: string, where: Record<string, unknown> = {}): Promise<number> {
  const row = await testDb(table).where(where).count<{ count: string }>("* as count").first();
  return Number(row?.count ?? 0);
}

import type { Knex } from "knex";
import { config } from "./lib/config";

// One connection string for every environment; scripts/test.sh points it at the test database.
export const databaseUrl = config.DATABASE_URL;

const knexConfig: Knex.Config = {
  client: "pg",
  connection: databaseUrl,
  pool: { min: 0, max: 10 },
  migrations: { directory: "./db/migrations", extension: "ts", loadExtensions: [".ts"] },
  seeds: { directory: "./seeds", extension: "ts", loadExtensions: [".ts"] },
};

export default knexConfig;

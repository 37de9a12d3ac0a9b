import type { Knex } from "knex";
import { config } from "./lib/config";

// One connection string for every environment; scripts/test.sh points it at the test database.
const knexConfig: Knex.Config = {
  client: "pg",
  connection: config.DATABASE_URL,
  pool: { min: 0, max: 10 },
  migrations: { directory: "./db/migrations", extension: "ts", loadExtensions: [".ts"] },
  seeds: { directory: "./seeds", extension: "ts", loadExtensions: [".ts"] },
};

export default knexConfig;

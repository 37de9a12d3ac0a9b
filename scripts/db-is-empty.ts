// Prints "empty" when no organisation exists yet, so npm start loads the demo only once.
import knex from "knex";
import knexConfig from "../knexfile";

async function main() {
  const db = knex(knexConfig);
  try {
    const row = await db("organisations").first("id");
    console.log(row ? "has-data" : "empty");
  } finally {
    await db.destroy();
  }
}

main();

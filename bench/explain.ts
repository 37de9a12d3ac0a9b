// The plans PostgreSQL chooses, with EXPLAIN (ANALYZE, BUFFERS), for the queries a yard asks
// most, on the bench organisation's 50,000 items: the session read, the tag lookup, the item
// page's item and history, pages of the stock list (sorted, filtered, searched) and the items
// due (the stock list's "overdue" filter, the digest's list, the Today counts). Each query is
// the db/ function's own SQL, caught as Knex sends it. A sequential scan of items is flagged,
// except where the query counts the whole organisation's stock. Run by bench/run.sh (DATABASE_URL: the bench database).
import pg from "pg";
import { db } from "@/db";
import { findItemByTag, getItem, listEvents, listItems, stockBuckets } from "@/db/items";
import { listDigestItems } from "@/db/reminders";
import { findSessionWithUser } from "@/db/sessions";
import { benchState, record } from "./lib";

type Caught = { sql: string; bindings: unknown[] };

async function caught(work: () => Promise<unknown>): Promise<Caught[]> {
  const out: Caught[] = [];
  const listen = (q: { sql: string; bindings?: unknown[] }) => out.push({ sql: q.sql, bindings: q.bindings ?? [] });
  db.on("query", listen);
  try {
    await work();
  } finally {
    db.removeListener("query", listen);
  }
  return out;
}

async function main() {
  const s = benchState();
  const today = new Date().toISOString().slice(0, 10);
  const soon = new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10);
  const list = { page: 1, perPage: 25, sort: "tagCode" as const, order: "asc" as const };
  const [session] = await db("user_sessions").select("id").limit(1);
  const cases: [string, () => Promise<unknown>][] = [
    ["session + person + organisation", () => findSessionWithUser(session?.id ?? "none")],
    ["tag lookup", () => findItemByTag(s.tagCodes[0]!)],
    ["item page: the item", () => getItem(s.organisationId, s.itemIds[0]!)],
    ["item page: its history", () => listEvents(s.organisationId, s.itemIds[0]!)],
    ["stock list, first page by tag", () => listItems(s.organisationId, list)],
    ["stock list, page 1000 by tag", () => listItems(s.organisationId, { ...list, page: 1000 })],
    ["stock list, by WLL descending", () => listItems(s.organisationId, { ...list, sort: "wllLb", order: "desc" })],
    ["stock list, by inspection due", () => listItems(s.organisationId, { ...list, sort: "nextInspectionDue" })],
    ["stock list, overdue (items due)", () => listItems(s.organisationId, { ...list, dueBefore: today, status: ["in_service"] })],
    ["stock list, search a tag prefix", () => listItems(s.organisationId, { ...list, q: "AC" })],
    ["digest: items due or tagged out", () => listDigestItems(s.organisationId, soon)],
    ["Today: stock by verdict", () => stockBuckets(s.organisationId, today, soon)],
  ];
  const flagged: string[] = [];
  const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 1 });
  for (const [name, work] of cases) {
    for (const q of await caught(work)) {
      const plan = (await pool.query(`explain (analyze, buffers, format text) ${q.sql}`, q.bindings)).rows.map((r: Record<string, string>) => r["QUERY PLAN"]).join("\n");
      const ms = /Execution Time: ([\d.]+) ms/.exec(plan)?.[1];
      // A count of the whole organisation's stock, or its buckets, reads every item: there a
      // sequential scan is the right plan. Anything that answers a page or one item must not.
      const wholeOrganisation = /^select count\(/.test(q.sql) || name.startsWith("Today");
      const seq = /Seq Scan on items/.test(plan) && !wholeOrganisation;
      console.log(`\n== ${name}: ${ms} ms${seq ? "  SEQ SCAN OF ITEMS" : ""}\n${q.sql}\n${plan}`);
      if (seq) flagged.push(`${name} (${ms} ms)`);
    }
  }
  console.log(`\n${flagged.length ? `sequential scans of items: ${flagged.join("; ")}` : "no sequential scan of items"}`);
  if (process.argv.includes("--record")) {
    record([{ what: "queries of the tag lookup, item page, stock list and items due on 50,000 items", figure: flagged.length ? `seq scan in: ${flagged.join("; ")}` : "index scans only", target: "no seq scan of items", baseline: "—", met: flagged.length === 0 }]);
  }
  await Promise.all([db.destroy(), pool.end()]);
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});

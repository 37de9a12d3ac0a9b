// The bench organisation, written straight into the bench database (bench/run.sh resets it
// first): an owner who signs in, one yard, and BENCH_ITEMS (50,000) items spread like a real
// yard (kinds, statuses, inspection dates, a last pre-use check on some), with valid tag
// codes. Writes .data/bench/state.json for the other scripts. Run by bench/run.sh.
import { mkdirSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { hash } from "@node-rs/argon2";
import knex from "knex";
import knexConfig from "../knexfile";
import { newTagCode } from "../lib/tags/code";
import { OUT, type BenchState } from "./lib";

const N = Number(process.env.BENCH_ITEMS ?? 50_000);

async function main() {
  const db = knex(knexConfig);
  const email = "bench-owner@bench-yard.example";
  const password = "bench-yard-password-2026";
  const [org] = await db("organisations").insert({ name: "Bench Yard Hire", time_zone: "America/Denver" }).returning("id");
  const organisationId: string = org.id;
  await db("users").insert({ id: "bench-owner", organisation_id: organisationId, email, name: "Bench Owner", role: "owner", designated: true, password_hash: await hash(password) });
  const [yard] = await db("yards").insert({ organisation_id: organisationId, name: "Bench yard" }).returning("id");
  // A second, empty organisation for the import bench (bench/import.ts), so the 100,000 rows
  // it adds never change the first's stock.
  const importEmail = "import-owner@bench-yard.example";
  const [importOrg] = await db("organisations").insert({ name: "Bench Import Hire", time_zone: "America/Denver" }).returning("id");
  await db("users").insert({ id: "bench-import-owner", organisation_id: importOrg.id, email: importEmail, name: "Import Owner", role: "owner", designated: true, password_hash: await hash(password) });
  await db("yards").insert({ organisation_id: importOrg.id, name: "Import yard" });

  const codes = new Set<string>();
  while (codes.size < N) codes.add(newTagCode());
  const t0 = performance.now();
  // Kinds, statuses and dates spread like a real yard; one item in three has a last pre-use check.
  await db.raw(
    `insert into items (organisation_id, tag_code, kind, grade, grade_marked, size, marked_wll_lb, status, yard_id, wll_lb, wll_source, serial,
                        next_inspection_due, last_checked_at, last_check_passed, details)
     select ?, c.code, (array['chain','binder','web-strap','hook','shackle'])[1 + c.g % 5], 70, true, (array['5/16','3/8','1/2'])[1 + c.g % 3],
            4700 + (c.g % 7) * 700,
            (array['in_service','in_service','in_service','in_service','tagged_out','retired'])[1 + c.g % 6], ?, 4700 + (c.g % 7) * 700,
            '49 CFR 393.108', 'BY-' || c.g, current_date + (c.g % 400) - 30,
            case when c.g % 3 = 0 then now() - (c.g % 50) * interval '1 day' end, case when c.g % 3 = 0 then c.g % 17 <> 0 end, '{}'::jsonb
     from (select u.code, u.n::int as g from unnest(?::text[]) with ordinality as u(code, n)) c`,
    [organisationId, yard.id, [...codes]],
  );
  await db.raw("analyze");
  const sample = await db("items").where({ organisation_id: organisationId }).orderByRaw("random()").limit(2000).select("id", "tag_code");
  console.log(`bench organisation: ${N.toLocaleString("en-US")} items written in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
  const state: BenchState = {
    organisationId,
    email,
    importOrganisationId: importOrg.id,
    importEmail,
    password,
    itemCount: N,
    tagCodes: sample.map((r) => r.tag_code as string),
    itemIds: sample.map((r) => r.id as string),
  };
  mkdirSync(OUT, { recursive: true });
  rmSync(path.join(OUT, "results.jsonl"), { force: true });
  writeFileSync(path.join(OUT, "state.json"), JSON.stringify(state));
  await db.destroy();
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});

import type { Knex } from "knex";
import { hash } from "@node-rs/argon2";
import { itemRating } from "../lib/stock/rating";
import type { ItemKind } from "../lib/stock/labels";
import { toWholeMm } from "../lib/stock/schemas";
import { newTagCode } from "../lib/tags/code";
import { PRE_USE_CHECKLISTS } from "../lib/stock/checklists";
import { evaluateMeasurements } from "../lib/stock/inspection";
import { DEFAULT_INTERVAL_DAYS } from "../lib/stock/intervals";

// The demo scenario: an invented groundworks outfit with one person per role, two yards
// and a realistic spread of tiedown gear. Names, places and addresses are made up.
// Demo password (documented in the README, demo only): yard-demo-2026

export const DEMO_PASSWORD = "yard-demo-2026";
export const DEMO_DOMAIN = "corvid-hollow.example";

type Item = {
  kind: string;
  grade?: number;
  size?: string;
  lengthFt?: number;
  markedWllLb?: number | null;
  serialPrefix: string;
  count: number;
  details?: Record<string, unknown>;
  costCents: number;
  gradeMarked?: boolean;
};

// Marked WLLs below are invented manufacturer markings in line with the 49 CFR 393.108
// defaults for the same grade and size; binders and straps carry their own markings.
const STOCK: Item[] = [
  { kind: "chain", grade: 70, size: "3/8", lengthFt: 20, markedWllLb: 6600, serialPrefix: "CH7-38", count: 12, details: { ends: "grab hook both ends" }, costCents: 11900 },
  { kind: "chain", grade: 70, size: "5/16", lengthFt: 20, markedWllLb: 4700, serialPrefix: "CH7-516", count: 8, details: { ends: "grab hook both ends" }, costCents: 8900 },
  { kind: "chain", grade: 80, size: "1/2", lengthFt: 16, markedWllLb: 12000, serialPrefix: "CH8-12", count: 4, details: { ends: "clevis grab hook both ends" }, costCents: 24500 },
  { kind: "chain", size: "3/8", lengthFt: 14, markedWllLb: null, gradeMarked: false, serialPrefix: "CH3-38", count: 2, details: { ends: "slip hook both ends", note: "old proof coil, no grade mark" }, costCents: 3500 },
  { kind: "binder", size: "3/8", markedWllLb: 5400, serialPrefix: "BR-516-38", count: 10, details: { mechanism: "ratchet", chainSizeRange: ["5/16", "3/8"] }, costCents: 6900 },
  { kind: "binder", size: "1/2", markedWllLb: 9200, serialPrefix: "BR-38-12", count: 4, details: { mechanism: "ratchet", chainSizeRange: ["3/8", "1/2"] }, costCents: 9400 },
  { kind: "binder", size: "3/8", markedWllLb: 5400, serialPrefix: "BL-516-38", count: 4, details: { mechanism: "lever", chainSizeRange: ["5/16", "3/8"] }, costCents: 4200 },
  { kind: "web-strap", size: "2", lengthFt: 27, markedWllLb: 3333, serialPrefix: "WS-2", count: 8, details: { widthIn: "2", ends: "flat hooks" }, costCents: 2900 },
  { kind: "web-strap", size: "4", lengthFt: 30, markedWllLb: 5400, serialPrefix: "WS-4", count: 6, details: { widthIn: "4", ends: "wire hooks" }, costCents: 4900 },
  { kind: "hook", grade: 70, size: "3/8", markedWllLb: 6600, serialPrefix: "HK7-38", count: 6, details: { style: "clevis grab hook" }, costCents: 1400 },
  { kind: "shackle", size: "5/8", markedWllLb: 6500, serialPrefix: "SH-58", count: 4, details: { style: "screw pin anchor shackle" }, costCents: 1900 },
];

function addDays(days: number): string {
  const d = new Date();
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

export async function seed(knex: Knex): Promise<void> {
  if (await knex("organisations").first("id")) return; // never overwrite real data

  const passwordHash = await hash(DEMO_PASSWORD);
  await knex.transaction(async (trx) => {
    const [org] = await trx("organisations").insert({ name: "Corvid Hollow Groundworks", time_zone: "America/Chicago" }).returning("id");
    const organisationId: string = org.id;
    const people = [
      { id: "demo-owner-olive", name: "Olive Marchetti", email: `olive@${DEMO_DOMAIN}`, role: "owner", designated: true },
      { id: "demo-planner-pete", name: "Pete Anand", email: `pete@${DEMO_DOMAIN}`, role: "planner", designated: false },
      { id: "demo-yard-yara", name: "Yara Lindqvist", email: `yara@${DEMO_DOMAIN}`, role: "yard_hand", designated: false },
    ];
    await trx("users").insert(people.map((p) => ({ ...p, organisation_id: organisationId, password_hash: passwordHash })));

    const yards = await trx("yards")
      .insert([
        { organisation_id: organisationId, name: "Home yard", address: "7 Quarry Spur Road" },
        { organisation_id: organisationId, name: "North lot", address: "Behind the gravel pit, Route 9" },
      ])
      .returning(["id", "name"]);

    const rows: Record<string, unknown>[] = [];
    let n = 0;
    for (const item of STOCK) {
      for (let i = 1; i <= item.count; i++, n++) {
        // A few items in other states, so every screen has something to show.
        const status = n === 3 ? "tagged_out" : n === 17 ? "tagged_out" : n === 40 ? "retired" : n === 55 ? "lost" : "in_service";
        const rating = itemRating({
          kind: item.kind as ItemKind,
          grade: item.grade ?? null,
          gradeMarked: item.gradeMarked ?? true,
          size: item.size ?? null,
          markedWllLb: item.markedWllLb ?? null,
          details: item.details as { chainSizeRange?: [string, string] },
        });
        rows.push({
          organisation_id: organisationId,
          grade_marked: item.gradeMarked ?? true,
          wll_lb: rating.wllLb,
          wll_source: rating.source,
          tag_code: newTagCode(),
          kind: item.kind,
          grade: item.grade ?? null,
          size: item.size ?? null,
          length_mm: item.lengthFt ? toWholeMm({ value: item.lengthFt, unit: "ft" }) : null,
          marked_wll_lb: item.markedWllLb ?? null,
          serial: `${item.serialPrefix}-${String(i).padStart(3, "0")}`,
          status,
          yard_id: yards[n % 3 === 0 ? 1 : 0].id,
          in_service_on: addDays(-400 + (n * 7) % 360),
          cost_cents: item.costCents,
          next_inspection_due: addDays(((n * 11) % 120) - 10),
          details: JSON.stringify(item.details ?? {}),
        });
      }
    }
    const inserted: { id: string; status: string; kind: string; size: string | null }[] = await trx("items").insert(rows).returning(["id", "status", "kind", "size"]);
    // A believable history: every item was put in service and had its periodic inspection a
    // interval before it next falls due, most were checked this week, the tagged-out ones
    // failed a pre-use check, and over the last months a few were tagged out and came back
    // (damage reported, a failed check, an inspection that held one for repair).
    const events: Record<string, unknown>[] = [];
    const DAY = 86_400_000;
    inserted.forEach((item, i) => {
      const at = (daysAgo: number, hour = 7) => new Date(Date.now() - daysAgo * DAY - hour * 3_600_000).toISOString();
      const kind = item.kind as ItemKind;
      const clean = JSON.stringify(PRE_USE_CHECKLISTS[kind].map((p) => ({ id: p.id, label: p.label, defect: false })));
      const own: Record<string, unknown>[] = [];
      own.push({ type: "created", actor_id: "demo-owner-olive", at: at(400), note: "Put in service" });
      const due = rows[i].next_inspection_due as string; // rows come back in the order given
      {
        const inspectedAgo = Math.round((Date.now() - Date.parse(`${due}T12:00:00Z`)) / DAY) + DEFAULT_INTERVAL_DAYS[kind];
        if (inspectedAgo > 3 && inspectedAgo < 390) {
          own.push({ type: "inspection", outcome: "in_service", actor_id: "demo-owner-olive", at: at(inspectedAgo, 4), checklist: clean, measurements: JSON.stringify(evaluateMeasurements(kind, item.size, demoMeasurements(kind, i))), note: i % 4 === 0 ? "Yearly inspection in the yard shop" : null });
        }
      }
      if (item.status === "tagged_out") {
        own.push({ type: "check", outcome: "fail", actor_id: "demo-yard-yara", at: at(2), note: item.kind === "chain" ? "Hook at one end opened up after the last haul" : "Handle bent", checklist: JSON.stringify([]) });
        own.push({ type: "tag_out", actor_id: "demo-yard-yara", at: at(2), note: "Tagged out after a failed pre-use check" });
      } else if (item.status === "retired") {
        own.push({ type: "retired", actor_id: "demo-owner-olive", at: at(40), note: "Links stretched past the limit at the yearly inspection" });
      } else if (item.status === "lost") {
        own.push({ type: "lost", actor_id: "demo-planner-pete", at: at(20), note: "Not back from the Millbrook culvert job" });
      } else if (i % 3 !== 2) {
        // Earlier tag-outs, each answered, all before this week's pass.
        const back = 12 + ((i * 23) % 160);
        if (i % 9 === 4) {
          own.push({ type: "tag_out", actor_id: "demo-yard-yara", at: at(back, 9), note: "Strap snagged on the deck edge, outer fibres cut" });
          own.push({ type: "inspection", outcome: "in_service", actor_id: "demo-owner-olive", at: at(back - 2, 5), checklist: clean, measurements: JSON.stringify(evaluateMeasurements(kind, item.size, demoMeasurements(kind, i))), note: "Damage within the limit after a close look" });
        } else if (i % 11 === 5) {
          const failed = JSON.stringify(PRE_USE_CHECKLISTS[kind].map((p, n) => ({ id: p.id, label: p.label, defect: n === 0 })));
          own.push({ type: "check", outcome: "fail", actor_id: "demo-yard-yara", at: at(back, 8), checklist: failed, note: "Looked wrong at the morning check" });
          own.push({ type: "tag_out", actor_id: "demo-yard-yara", at: at(back, 8), note: "Tagged out after a failed pre-use check" });
          own.push({ type: "return_to_service", actor_id: "demo-owner-olive", at: at(back - 3, 5), note: "Cleaned and looked at again: dirt, not a crack" });
        } else if (i % 13 === 6) {
          own.push({ type: "inspection", outcome: "repair", actor_id: "demo-owner-olive", at: at(back, 6), checklist: clean, measurements: JSON.stringify(evaluateMeasurements(kind, item.size, demoMeasurements(kind, i))), note: "Hardware worn at the hook: sent for repair" });
          own.push({ type: "return_to_service", actor_id: "demo-owner-olive", at: at(back - 5, 5), note: "Back from repair with new end hardware" });
        }
        own.push({ type: "check", outcome: "pass", actor_id: "demo-yard-yara", at: at(i % 5) });
      }
      own.sort((a, b) => String(a.at).localeCompare(String(b.at)));
      for (const e of own) events.push({ organisation_id: organisationId, item_id: item.id, ...e });
    });
    await trx("item_events").insert(events);
    await trx.raw(`update items i set last_inspected_on = e.on from
      (select item_id, max(at)::date as on from item_events where type = 'inspection' group by item_id) e
      where e.item_id = i.id and i.organisation_id = ?`, [organisationId]);
    await trx.raw(`update items i set last_checked_at = e.at from
      (select item_id, max(at) as at from item_events where type = 'check' group by item_id) e
      where e.item_id = i.id and i.organisation_id = ?`, [organisationId]);
    await trx("audit_log").insert({
      organisation_id: organisationId,
      actor_id: null,
      action: "demo.loaded",
      entity: "organisation",
      entity_id: organisationId,
      after: JSON.stringify({ items: rows.length }),
    });
  });
}

/** What the demo's inspector measured: worn a little, within the limits (lib/stock/inspection.ts). */
function demoMeasurements(kind: ItemKind, i: number): Record<string, number> {
  const wobble = (i % 5) / 10;
  switch (kind) {
    case "chain":
      return { linkThickness: 0.36 - wobble / 50, stretch: 1 + wobble * 2 };
    case "hook":
      return { throatNew: 1, throatNow: 1.01 + wobble / 20, wear: 2 + wobble * 5 };
    case "web-strap":
      return { damage: wobble / 4 };
    case "shackle":
    case "rated-item":
      return { wear: 1 + wobble * 10 };
    default:
      return {};
  }
}

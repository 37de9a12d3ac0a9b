import type { Knex } from "knex";
import { addDays, DEFAULT_TIME_ZONE, todayIn } from "../lib/time";
import type { ItemStatus } from "../lib/stock/labels";
import { MM_PER_IN } from "../lib/securement/units";
import { itemUsability } from "../lib/stock/usability";

// The demo outfit's machines and trailers (invented names and figures in the range of
// compact equipment), and two kits for tomorrow in the organisation's time zone: one that
// passes, and one that a planner would recognise as not ready (a corner short, a bent stake
// pocket, nothing on the bucket, an old chain with no grade mark).

const ORGANISATION = "Corvid Hollow Groundworks";
const PLANNER = "demo-planner-pete";
const YARD_HAND = "demo-yard-yara";

const ft = (feet: number, inches = 0) => Math.round((feet * 12 + inches) * MM_PER_IN);

const MACHINES = [
  {
    name: "Unit 12 mini excavator",
    machine_class: "mini-excavator",
    weight_lb: 8100,
    length_mm: 4900,
    width_mm: 1740,
    height_mm: 2500,
    articulated: false,
    accessories: ["bucket", "blade"],
    tiedown_points: [
      { label: "front left", side: "left", positionMm: 300 },
      { label: "front right", side: "right", positionMm: 300 },
      { label: "rear left", side: "left", positionMm: 4500 },
      { label: "rear right", side: "right", positionMm: 4500 },
    ],
    cg_from_front_mm: 2300,
  },
  {
    name: "Unit 7 track loader",
    machine_class: "compact-track-loader",
    weight_lb: 10400,
    length_mm: 3800,
    width_mm: 1980,
    height_mm: 2100,
    articulated: false,
    accessories: ["bucket"],
    tiedown_points: [
      { label: "front left", side: "left", positionMm: 500 },
      { label: "front right", side: "right", positionMm: 500 },
      { label: "rear left", side: "left", positionMm: 3400 },
      { label: "rear right", side: "right", positionMm: 3400 },
    ],
    cg_from_front_mm: null,
  },
  {
    name: "Unit 4 wheel loader",
    machine_class: "wheel-loader",
    weight_lb: 9300,
    length_mm: 5200,
    width_mm: 1850,
    height_mm: 2600,
    articulated: true,
    accessories: ["bucket"],
    tiedown_points: [
      { label: "front left", side: "left", positionMm: 700 },
      { label: "front right", side: "right", positionMm: 700 },
      { label: "rear left", side: "left", positionMm: 4800 },
      { label: "rear right", side: "right", positionMm: 4800 },
    ],
    cg_from_front_mm: null,
  },
];

type Point = { label: string; side: string; position_mm: number; wll_lb: number; status?: string };

const TRAILERS: { row: Record<string, unknown>; points: Point[] }[] = [
  {
    row: { name: "Deck 20 tilt", trailer_type: "tilt-deck", coupling: "pintle", deck_length_mm: ft(20), tilt_length_mm: ft(20), deck_width_mm: 2080, gvwr_lb: 14000, empty_weight_lb: 3600, empty_tongue_weight_lb: 450, hitch_to_axle_mm: ft(18), hitch_to_deck_front_mm: 1500 },
    points: [
      { label: "L1", side: "left", position_mm: 200, wll_lb: 6600 },
      { label: "R1", side: "right", position_mm: 200, wll_lb: 6600 },
      { label: "L2", side: "left", position_mm: 3000, wll_lb: 6600 },
      { label: "R2", side: "right", position_mm: 3000, wll_lb: 6600 },
      { label: "L3", side: "left", position_mm: 5900, wll_lb: 6600 },
      { label: "R3", side: "right", position_mm: 5900, wll_lb: 6600 },
    ],
  },
  {
    row: { name: "Gooseneck 25+5", trailer_type: "gooseneck", coupling: "gooseneck", deck_length_mm: ft(30), tilt_length_mm: 0, deck_width_mm: 2590, gvwr_lb: 25900, empty_weight_lb: 7400, empty_tongue_weight_lb: 1900, hitch_to_axle_mm: ft(27), hitch_to_deck_front_mm: null },
    points: [
      { label: "L1", side: "left", position_mm: 1000, wll_lb: 5000 },
      { label: "R1", side: "right", position_mm: 1000, wll_lb: 5000 },
      { label: "L2", side: "left", position_mm: 4000, wll_lb: 5000 },
      { label: "R2", side: "right", position_mm: 4000, wll_lb: 5000 },
      { label: "L3", side: "left", position_mm: 7000, wll_lb: 5000 },
      { label: "R3", side: "right", position_mm: 7000, wll_lb: 5000, status: "tagged_out" },
      { label: "L4", side: "left", position_mm: 8900, wll_lb: 5000 },
      { label: "R4", side: "right", position_mm: 8900, wll_lb: 5000 },
    ],
  },
  {
    row: { name: "Tag 16", trailer_type: "tag-along", coupling: "ball", deck_length_mm: ft(16), tilt_length_mm: 0, deck_width_mm: 2030, gvwr_lb: 9990, empty_weight_lb: 2400, empty_tongue_weight_lb: 310, hitch_to_axle_mm: ft(14, 6), hitch_to_deck_front_mm: 1200 },
    points: [
      { label: "FL", side: "left", position_mm: 150, wll_lb: 5000 },
      { label: "FR", side: "right", position_mm: 150, wll_lb: 5000 },
      { label: "RL", side: "left", position_mm: 4700, wll_lb: 5000 },
      { label: "RR", side: "right", position_mm: 4700, wll_lb: 5000 },
    ],
  },
];

interface SeedItem {
  id: string;
  serial: string;
  status: string;
  next_inspection_due: string | null;
  wll_lb: number | null;
}

export async function seed(knex: Knex): Promise<void> {
  const org = await knex("organisations").where({ name: ORGANISATION }).first("*");
  if (!org) return; // only the demo outfit gets demo machines
  if (await knex("machines").where({ organisation_id: org.id }).first("id")) return; // never twice
  const organisationId: string = org.id;
  const today = todayIn((org.time_zone as string | undefined) || DEFAULT_TIME_ZONE);
  const tomorrow = addDays(today, 1);

  await knex.transaction(async (trx) => {
    const machines: { id: string; name: string }[] = await trx("machines")
      .insert(MACHINES.map((m) => ({ ...m, organisation_id: organisationId, accessories: JSON.stringify(m.accessories), tiedown_points: JSON.stringify(m.tiedown_points) })))
      .returning(["id", "name"]);
    const machine = (name: string) => machines.find((m) => m.name === name)!.id;

    const anchors = new Map<string, string>();
    const trailers = new Map<string, string>();
    for (const t of TRAILERS) {
      const [row] = await trx("trailers").insert({ ...t.row, organisation_id: organisationId }).returning(["id", "name"]);
      trailers.set(row.name, row.id);
      for (const p of t.points) {
        const [a] = await trx("anchor_points")
          .insert({ organisation_id: organisationId, trailer_id: row.id, label: p.label, side: p.side, position_mm: p.position_mm, wll_lb: p.wll_lb, status: p.status ?? "in_service", next_inspection_due: addDays(today, 150), last_inspected_on: addDays(today, -215) })
          .returning("id");
        anchors.set(`${row.name}/${p.label}`, a.id);
        await trx("anchor_point_events").insert({ organisation_id: organisationId, anchor_point_id: a.id, type: "created", actor_id: "demo-owner-olive", at: new Date(Date.now() - 300 * 86_400_000) });
        if (p.status === "tagged_out") {
          await trx("anchor_point_events").insert({ organisation_id: organisationId, anchor_point_id: a.id, type: "tag_out", note: "Stake pocket bent outward after the Millbrook haul; weld cracked at the rail", actor_id: YARD_HAND, at: new Date(Date.now() - 86_400_000) });
        }
      }
    }

    // Gear that may be used tomorrow, by serial prefix, in serial order.
    const stock: SeedItem[] = await trx("items")
      .where({ organisation_id: organisationId })
      .orderBy("serial")
      .select("id", "serial", "status", "wll_lb", trx.raw("to_char(next_inspection_due, 'YYYY-MM-DD') as next_inspection_due"));
    const taken = new Set<string>();
    const take = (prefix: string): string => {
      const item = stock.find(
        (i) => i.serial.startsWith(`${prefix}-`) && !taken.has(i.id) && itemUsability({ status: i.status as ItemStatus, nextInspectionDue: i.next_inspection_due, wllLb: i.wll_lb }, tomorrow).ok,
      );
      if (!item) throw new Error(`demo fleet: no usable ${prefix} item left for ${tomorrow}`);
      taken.add(item.id);
      return item.id;
    };

    async function kit(k: { job: string; site: string; machine: string; trailer: string; placedMm?: number; tiedowns: { label: string; anchor: string; secures?: string; machinePoint?: string; attachment?: string; items: string[] }[] }) {
      const [row] = await trx("kits")
        .insert({ organisation_id: organisationId, date: tomorrow, job: k.job, site: k.site, machine_id: machine(k.machine), trailer_id: trailers.get(k.trailer), machine_front_from_deck_front_mm: k.placedMm ?? null, created_by: PLANNER })
        .returning("id");
      for (const [position, t] of k.tiedowns.entries()) {
        const [td] = await trx("kit_tiedowns")
          .insert({ organisation_id: organisationId, kit_id: row.id, position, label: t.label, anchor_point_id: anchors.get(`${k.trailer}/${t.anchor}`), attachment: t.attachment ?? "direct", secures: t.secures ?? "machine", machine_point: t.machinePoint ?? null })
          .returning("id");
        await trx("kit_items").insert(t.items.map((prefix, i) => ({ organisation_id: organisationId, kit_id: row.id, tiedown_id: td.id, item_id: take(prefix), kit_date: tomorrow, position: i })));
      }
      await trx("audit_log").insert({ organisation_id: organisationId, actor_id: PLANNER, action: "kit.created", entity: "kit", entity_id: row.id, after: JSON.stringify({ job: k.job, date: tomorrow, demo: true }) });
    }

    const corner = (label: string, anchor: string, items: string[]) => ({ label, anchor, machinePoint: label, items });
    // Passes: four corners of 3/8 in grade 70 chain with 5,400 lb binders, and the bucket
    // and blade each held by a 5/16 in chain (49 CFR 393.130(b)(1)). The machine's front sits
    // 1 m back from the deck front: about 1,460 lb on the pintle, 12.5 % of the loaded
    // 11,700 lb, inside the 10–15 % band (lib/kits/placement.ts).
    await kit({
      job: "Hollins driveway",
      site: "14 Quarry Lane, Hollins",
      machine: "Unit 12 mini excavator",
      trailer: "Deck 20 tilt",
      placedMm: 1000,
      tiedowns: [
        corner("front left", "L1", ["CH7-38", "BR-516-38"]),
        corner("front right", "R1", ["CH7-38", "BR-516-38"]),
        corner("rear left", "L3", ["CH7-38", "BR-516-38"]),
        corner("rear right", "R3", ["CH7-38", "BR-516-38"]),
        { label: "blade", anchor: "L2", secures: "blade", attachment: "indirect-across", items: ["CH7-516", "BR-516-38"] },
        { label: "bucket", anchor: "R2", secures: "bucket", attachment: "indirect-across", items: ["CH7-516", "BL-516-38"] },
      ],
    });
    // Does not pass: a 10,400 lb loader needs four tiedowns on the machine (49 CFR
    // 393.130(c)(1)) and has three; the rear right was planned on R3 before the yard found
    // that stake pocket bent; nothing holds the bucket; the rear left is the old proof coil
    // chain with no grade mark, rated as grade 30 (49 CFR 393.108(d)). Not placed: the
    // gooseneck's hitch-to-deck-front distance has not been measured.
    await kit({
      job: "Brookside culvert",
      site: "Brookside Road culvert, by the mill bridge",
      machine: "Unit 7 track loader",
      trailer: "Gooseneck 25+5",
      tiedowns: [
        corner("front left", "L1", ["CH7-38", "BR-516-38"]),
        corner("rear left", "L4", ["CH3-38", "BR-516-38"]),
        corner("rear right", "R3", ["CH7-38", "BR-516-38"]),
      ],
    });
  });
}

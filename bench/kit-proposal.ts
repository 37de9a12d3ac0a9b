// Benchmark of "propose a kit" over a yard of 500 items: prints the time per proposal
// (median and 95th percentile over repeated runs) against the target of 200 ms. Asserts nothing.
// Run: node --import tsx bench/kit-proposal.ts (bench/run.sh adds --record for the table)
import { performance } from "node:perf_hooks";
import type { AnchorPoint, Kit, KitItem, Machine, Trailer } from "../lib/kits/model";
import { proposeKit, type UnavailableItem } from "../lib/kits/proposal";
import { record } from "./lib";

const TARGET_MS = 200;
const RUNS = 200;
const usable = { ok: true, reasons: [] };
const taggedOut = { ok: false, reasons: [{ code: "TAGGED_OUT" as const, message: "Tagged out." }] };

// An invented yard: chain of five sizes and grades, binders of three ranges from two makers
// (different marked WLLs), web straps, hooks and shackles. 500 items in all.
let n = 0;
function item(kind: string, size: string, wllLb: number, extra: Partial<KitItem> = {}): KitItem {
  n++;
  return {
    id: `item-${n}`,
    tagCode: `T${String(n).padStart(5, "0")}`,
    kind,
    description: `${kind} ${size}`,
    grade: null,
    gradeMarked: true,
    size,
    markedWllLb: wllLb,
    wllLb,
    details: {},
    usable,
    ...extra,
  };
}
const many = (count: number, make: () => KitItem) => Array.from({ length: count }, make);
const binder = (lo: string, hi: string, wllLb: number) => item("binder", hi, wllLb, { details: { mechanism: "ratchet", chainSizeRange: [lo, hi] } });
const stock: KitItem[] = [
  ...many(60, () => item("chain", "5/16", 4700, { grade: 70 })),
  ...many(110, () => item("chain", "3/8", 6600, { grade: 70 })),
  ...many(50, () => item("chain", "1/2", 11300, { grade: 70 })),
  ...many(30, () => item("chain", "3/8", 7100, { grade: 80 })),
  ...many(20, () => item("chain", "1/4", 2600, { grade: 43 })),
  ...many(45, () => binder("5/16", "3/8", 5400)),
  ...many(30, () => binder("5/16", "3/8", 5000)),
  ...many(40, () => binder("3/8", "1/2", 9200)),
  ...many(20, () => binder("3/8", "1/2", 7100)),
  ...many(15, () => binder("1/2", "5/8", 13000)),
  ...many(20, () => item("web-strap", "2", 3335)),
  ...many(30, () => item("web-strap", "4", 5400)),
  ...many(15, () => item("hook", "3/8", 6600)),
  ...many(15, () => item("shackle", "1/2", 6500)),
];
if (stock.length !== 500) throw new Error(`the yard has ${stock.length} items, not 500`);

// About one item in six is in another kit that day or tagged out.
const free: KitItem[] = [];
const unavailable: UnavailableItem[] = [];
stock.forEach((it, i) => {
  if (i % 11 === 0) unavailable.push({ item: { ...it, usable: taggedOut }, reason: { code: "NOT_USABLE" } });
  else if (i % 13 === 0) unavailable.push({ item: it, reason: { code: "IN_OTHER_KIT", kitId: "k-other", job: "Mill Road culvert" } });
  else free.push(it);
});

const anchor = (id: string, side: AnchorPoint["side"], positionMm: number, wllLb = 6600): AnchorPoint => ({ id, label: id.toUpperCase(), side, positionMm, wllLb, status: "in_service", nextInspectionDue: null, usable });
const trailer: Trailer = {
  id: "t-1",
  name: "Tilt 24",
  trailerType: "tilt-deck",
  coupling: "pintle",
  deckLengthMm: 7300,
  tiltLengthMm: 7300,
  deckWidthMm: 2083,
  gvwrLb: 24000,
  emptyWeightLb: 5200,
  emptyTongueWeightLb: 700,
  hitchToAxleMm: 6200,
  hitchToDeckFrontMm: 1500,
  anchorPoints: [
    ...[150, 1800, 3600, 5400, 7150].flatMap((at, i) => [anchor(`l${i + 1}`, "left", at), anchor(`r${i + 1}`, "right", at)]),
    anchor("c1", "centre", 300, 5000),
    anchor("c2", "centre", 7000, 5000),
  ],
};
const corners = (lengthMm: number) => [
  { label: "front left", side: "left" as const, positionMm: 250 },
  { label: "front right", side: "right" as const, positionMm: 250 },
  { label: "rear left", side: "left" as const, positionMm: lengthMm - 250 },
  { label: "rear right", side: "right" as const, positionMm: lengthMm - 250 },
];
const machine = (over: Partial<Machine>): Machine => ({
  id: "m",
  name: "machine",
  machineClass: "mini-excavator",
  weightLb: 8100,
  lengthMm: 4900,
  widthMm: 1750,
  heightMm: 2500,
  articulated: false,
  accessories: [],
  tiedownPoints: corners(over.lengthMm ?? 4900),
  cgFromFrontMm: null,
  ...over,
});
const kit = (m: Machine, placedMm = 600): Kit => ({
  id: "k",
  date: "2026-12-03",
  job: "Bench",
  site: null,
  state: "draft",
  machine: m,
  trailer,
  articulationRestrained: false,
  machineFrontFromDeckFrontMm: placedMm,
  tiedowns: [],
});

const scenarios: [string, Kit][] = [
  ["8,100 lb mini excavator, blade (5 tiedowns)", kit(machine({ accessories: ["blade"] }))],
  ["18,000 lb excavator, bucket and blade (6)", kit(machine({ weightLb: 18000, lengthMm: 6200, accessories: ["bucket", "blade"], tiedownPoints: corners(6200) }), 500)],
  ["5,200 lb roller, straps allowed (4)", kit(machine({ machineClass: "roller", weightLb: 5200, lengthMm: 3200, tiedownPoints: corners(3200) }))],
  ["60,000 lb machine: nothing passes (6)", kit(machine({ weightLb: 60000, lengthMm: 6200, accessories: ["bucket", "blade"], tiedownPoints: corners(6200) }), 500)],
];

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
}

console.log(`node ${process.version}; ${stock.length} items, ${free.length} free, ${unavailable.length} not free; ${RUNS} runs per scenario; target < ${TARGET_MS} ms`);
let worstP95 = 0;
for (const [name, k] of scenarios) {
  for (let i = 0; i < 10; i++) proposeKit(k, free, unavailable); // warm-up
  const times: number[] = [];
  let last = proposeKit(k, free, unavailable);
  for (let i = 0; i < RUNS; i++) {
    const start = performance.now();
    last = proposeKit(k, free, unavailable);
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  const median = percentile(times, 50);
  const p95 = percentile(times, 95);
  worstP95 = Math.max(worstP95, p95);
  const verdict = last.pass ? `passes, ${last.tiedowns.flatMap((t) => t.itemIds).length} items` : `does not pass, ${last.missing.length} missing`;
  console.log(
    `${name.padEnd(46)} median ${median.toFixed(2).padStart(7)} ms  p95 ${p95.toFixed(2).padStart(7)} ms  ${p95 < TARGET_MS ? "under" : "OVER"} target  (${verdict})`,
  );
}
if (process.argv.includes("--record")) {
  record([{ what: "kit proposal, 500 items of stock (slowest of 4 kits, p95)", figure: `${worstP95.toFixed(2)} ms`, target: "< 200 ms", baseline: "—", met: worstP95 < TARGET_MS }]);
}

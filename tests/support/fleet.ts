import type { Client } from "./http";

// Machines, trailers, gear and kits made through the API for integration tests. Figures are
// invented but in the range of compact equipment.

async function ok(res: Promise<{ status: number; json: any; text: string }>, want = 201) {
  const r = await res;
  if (r.status !== want) throw new Error(`expected ${want}, got ${r.status}: ${r.text}`);
  return r.json;
}

let n = 0;
const unique = (prefix: string) => `${prefix} ${Date.now().toString(36)}-${(n++).toString(36)}`;

/** A 12,000 lb, 19 ft excavator with four corner points and no accessories. */
export function machineBody(over: Record<string, unknown> = {}) {
  return {
    name: unique("Unit"),
    class: "mini-excavator",
    weight: { value: 12000, unit: "lb" },
    length: { value: 19, unit: "ft" },
    articulated: false,
    accessories: [],
    tiedownPoints: [
      { label: "front left", side: "left", position: { value: 300, unit: "mm" } },
      { label: "front right", side: "right", position: { value: 300, unit: "mm" } },
      { label: "rear left", side: "left", position: { value: 5400, unit: "mm" } },
      { label: "rear right", side: "right", position: { value: 5400, unit: "mm" } },
    ],
    ...over,
  };
}

/** A 20 ft tilt deck with four 6,600 lb corner D-rings and a 4,000 lb centre pocket. */
export function trailerBody(over: Record<string, unknown> = {}) {
  const point = (label: string, side: string, mm: number, wll = 6600) => ({ label, side, position: { value: mm, unit: "mm" }, wll: { value: wll, unit: "lb" } });
  return {
    name: unique("Deck"),
    type: "tilt-deck",
    deckLength: { value: 20, unit: "ft" },
    gvwr: { value: 22000, unit: "lb" },
    emptyWeight: { value: 5000, unit: "lb" },
    emptyTongueWeight: { value: 600, unit: "lb" },
    hitchToAxle: { value: 22, unit: "ft" },
    anchorPoints: [point("FL", "left", 200), point("FR", "right", 200), point("RL", "left", 5900), point("RR", "right", 5900), point("C1", "centre", 3000, 4000)],
    ...over,
  };
}

export async function makeMachine(client: Client, over: Record<string, unknown> = {}) {
  return ok(client.post("/api/v1/machines", machineBody(over)));
}

export async function makeTrailer(client: Client, over: Record<string, unknown> = {}) {
  return ok(client.post("/api/v1/trailers", trailerBody(over)));
}

/** A grade 70, 3/8 in chain (6,600 lb from the 49 CFR 393.108 table). */
export async function makeChain(client: Client, size = "3/8") {
  return ok(client.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size }));
}

/** A ratchet binder marked 5,400 lb for 5/16–3/8 in chain. */
export async function makeBinder(client: Client, range: [string, string] = ["5/16", "3/8"], wllLb = 5400) {
  return ok(client.post("/api/v1/items", { kind: "binder", marking: "wll", markedWll: { value: wllLb, unit: "lb" }, chainSizeRange: range, mechanism: "ratchet" }));
}

export async function makeKit(client: Client, body: { date: string; machineId: string; trailerId: string; job?: string }) {
  return ok(client.post("/api/v1/kits", { job: unique("Job"), ...body }));
}

export function anchorId(trailer: { anchorPoints: { id: string; label: string }[] }, label: string): string {
  const a = trailer.anchorPoints.find((p) => p.label === label);
  if (!a) throw new Error(`no anchor point ${label}`);
  return a.id;
}

/** Today in UTC and a few days on, as YYYY-MM-DD. */
export function day(offset: number): string {
  const d = new Date();
  d.setUTCDate(d.getUTCDate() + offset);
  return d.toISOString().slice(0, 10);
}

import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addMember, BASE_URL, Client, newOrganisation } from "../support/http";
import { testDb } from "../support/db";
import { PRE_USE_CHECKLISTS } from "@/lib/stock/checklists";
import { MAX_REPORT_EVENTS } from "@/lib/records/query";
import { addDays, formatDay, todayIn } from "@/lib/time";

// The owner's dashboard, records and audit log against the real app: each figure of the home
// page opens exactly the rows it counts; the records of a seeded scenario as CSV and as the
// printed report; the audit log's filters and export; who may see each, and that another
// organisation sees nothing of this one.

const ZONE = "America/Chicago";
let owner: Client;
let planner: Client;
let hand: Client;
let inspectorHand: Client;
let outsider: Client;
let orgName: string;
let today: string;
const ids = { chain: "", strap: "", tagged: "", overdue: "", unrated: "", retired: "", dueSoon: "" };
const tags: Record<string, string> = {};

const answers = (kind: keyof typeof PRE_USE_CHECKLISTS, defect: string | null = null) => PRE_USE_CHECKLISTS[kind].map((p) => ({ id: p.id, defect: p.id === defect }));

async function item(body: Record<string, unknown>): Promise<{ id: string; tagCode: string }> {
  const res = await owner.post("/api/v1/items", body);
  expect(res.status, res.text).toBe(201);
  return res.json;
}

async function event(client: Client, id: string, body: Record<string, unknown>) {
  const res = await client.post(`/api/v1/items/${id}/events`, body);
  expect(res.status, res.text).toBeLessThan(300);
  return res.json;
}

beforeAll(async () => {
  orgName = `Records Co ${Date.now().toString(36)}`;
  const org = await newOrganisation(orgName);
  owner = org.owner;
  await testDb("organisations").where({ id: org.organisationId }).update({ time_zone: ZONE });
  today = todayIn(ZONE);
  planner = (await addMember(owner, "planner")).client;
  hand = (await addMember(owner, "yard_hand")).client;
  inspectorHand = (await addMember(owner, "yard_hand", true)).client;
  outsider = (await newOrganisation("Other Records Co")).owner;

  // The scenario: a chain inspected with its link measured and kept in service, a strap that
  // failed its pre-use check (tagged out) and came back after an inspection, an item still
  // tagged out, one overdue, one without a WLL, one retired, one due in a few days.
  const chain = await item({ kind: "chain", marking: "grade", grade: 70, size: "3/8", serial: "=HYPERLINK(\"http://x\")" });
  const strap = await item({ kind: "web-strap", marking: "wll", markedWll: { value: 5400, unit: "lb" }, size: "4", serial: "REC-WS-1" });
  const tagged = await item({ kind: "chain", marking: "grade", grade: 70, size: "3/8", serial: "REC-CH-2" });
  const overdue = await item({ kind: "chain", marking: "grade", grade: 70, size: "5/16", serial: "REC-CH-3" });
  const unrated = await item({ kind: "chain", marking: "grade", grade: 70, size: "3/8", serial: "REC-CH-4" });
  const retired = await item({ kind: "hook", marking: "wll", markedWll: { value: 6600, unit: "lb" }, grade: 70, size: "3/8", serial: "REC-HK-1" });
  const dueSoon = await item({ kind: "shackle", marking: "wll", markedWll: { value: 6500, unit: "lb" }, size: "5/8", serial: "REC-SH-1" });
  Object.assign(ids, { chain: chain.id, strap: strap.id, tagged: tagged.id, overdue: overdue.id, unrated: unrated.id, retired: retired.id, dueSoon: dueSoon.id });
  Object.assign(tags, { chain: chain.tagCode, strap: strap.tagCode, tagged: tagged.tagCode });

  await event(owner, chain.id, { type: "inspection", answers: answers("chain"), measurements: { linkThickness: 0.36, stretch: 2 }, verdict: "in_service", note: "=cmd|' /C calc'!A0" });
  await event(hand, strap.id, { type: "check", answers: answers("web-strap", "cuts"), note: "Cut near the hook" });
  await event(inspectorHand, strap.id, { type: "inspection", answers: answers("web-strap"), measurements: { damage: 0.25 }, verdict: "in_service", note: "Cut within the limit" });
  await event(hand, tagged.id, { type: "tag_out", note: "Binder handle bent it" });
  await event(owner, retired.id, { type: "retired", reason: "Throat opened up" });
  await testDb("items").where({ id: overdue.id }).update({ next_inspection_due: addDays(today, -5) });
  await testDb("items").where({ id: dueSoon.id }).update({ next_inspection_due: addDays(today, 3) });
  // An item the engine can no longer rate (an old record): only the database holds such a one.
  await testDb("items").where({ id: unrated.id }).update({ wll_lb: null, wll_source: null });
}, 120_000);

afterAll(() => testDb.destroy());

/** Every link on a page to the stock list that shows a number: [query, the number]. */
function stockFigures(html: string): [string, number][] {
  const out: [string, number][] = [];
  for (const m of html.matchAll(/<a[^>]*href="\/stock\?([^"]*)"[^>]*>(?:<span[^>]*>)?([\d,]+)</g)) {
    out.push([m[1].replaceAll("&amp;", "&"), Number(m[2].replace(/,/g, ""))]);
  }
  return out;
}

describe("the dashboard", () => {
  it("links every figure to the stock list of exactly the rows it counts", async () => {
    const page = await owner.get("/");
    expect(page.status).toBe(200);
    const figures = stockFigures(page.text);
    // the tiles, the twelve weeks, the kinds by status and the totals
    expect(figures.length).toBeGreaterThan(20);
    for (const [query, count] of figures) {
      const list = await owner.get(`/api/v1/items?${query}&perPage=1`);
      expect(list.status, `${query}: ${list.text}`).toBe(200);
      expect(list.json.total, `/stock?${query}`).toBe(count);
    }
    const byQuery = new Map(figures);
    expect(byQuery.get("status=tagged_out")).toBe(1);
    expect(byQuery.get("due=overdue&status=in_service")).toBe(1);
    expect(byQuery.get("status=in_service&rated=no&due=current")).toBe(1);
    expect(byQuery.get("status=retired")).toBe(1);
  });

  it("counts this week's inspections from today, and the tag-outs of this month by reason", async () => {
    const page = await owner.get("/");
    const thisWeek = stockFigures(page.text).find(([q]) => q.startsWith(`status=in_service&dueFrom=${today}&`));
    expect(thisWeek).toBeDefined();
    expect(page.text).toContain("Tag-outs by reason, last 6 months");
    // the strap's failed check and the reported damage, each once (the check's own tag-out entry is not counted again)
    expect(page.text).toMatch(/2 tag-outs since [^:]+: 1 failed pre-use check, 1 damage reported, 0 inspection: held for repair, 0 found after being lost\./);
    expect(page.text).toContain("Tagged out: waiting for a decision");
    expect(page.text).toContain(tags.tagged);
  });

  it("shows a planner the charts but not the tag-outs or imports, and a yard hand neither", async () => {
    const forPlanner = await planner.get("/");
    expect(forPlanner.text).toContain("Inspections due, week by week");
    expect(forPlanner.text).not.toContain("Tag-outs by reason");
    expect(forPlanner.text).not.toContain("Recent imports");
    const forHand = await hand.get("/");
    expect(forHand.text).not.toContain("Inspections due, week by week");
    expect(forHand.text).toContain("Overdue for inspection");
  });
});

describe("records", () => {
  it("answer the seeded scenario as CSV: who, the verdicts, the measured values beside their limits, formulas neutralised", async () => {
    const res = await owner.get(`/api/v1/records?from=${addDays(today, -7)}&to=${today}&format=csv`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/csv");
    expect(res.headers.get("content-disposition")).toContain(`linkyard-records-${addDays(today, -7)}-to-${today}.csv`);
    const { data } = Papa.parse<Record<string, string>>(res.text.replace(/^\ufeff/, ""), { header: true, skipEmptyLines: true });
    const chainRows = data.filter((r) => r["Tag code"] === tags.chain);
    expect(chainRows.map((r) => r.Entry)).toEqual(["Added to stock", "Periodic inspection: keep in service"]);
    const inspection = chainRows[1];
    expect(inspection).toMatchObject({
      "Verdict or outcome": "Keep in service",
      Measured: "Thinnest link, measured thickness: 0.36 in; Stretch over a measured length of chain: 2 %",
      Limits: "Thinnest link, measured thickness: below 0.342 in for 3/8 in chain; Stretch over a measured length of chain: more than 5 %",
      "Past a limit": "no",
      By: "Owner Person",
      "Serial/Lot": "'=HYPERLINK(\"http://x\")",
      Note: "'=cmd|' /C calc'!A0",
      "Time zone": ZONE,
      "WLL (lb)": "6600",
    });
    expect(inspection["Date and time"]).toMatch(new RegExp(`^${today} \\d{2}:\\d{2}$`));
    const strap = data.filter((r) => r["Tag code"] === tags.strap);
    expect(strap.map((r) => [r.Entry, r.By])).toEqual([
      ["Added to stock", "Owner Person"],
      ["Pre-use check: failed, defects found (tagged out)", "yard_hand person"],
      ["Tagged out: do not use", "yard_hand person"],
      ["Periodic inspection: keep in service", "yard_hand person"],
    ]);
    expect(strap[1]["Defects found"]).toBe("Cuts, tears, holes or snags in the webbing");
    expect(strap[3]).toMatchObject({ Limits: "Largest cut, tear or burn, across the webbing: larger than 0.75 in on 4 in webbing", "Status now": "In service" });
  });

  it("filter by kind, status now and tag code, and by one item", async () => {
    const straps = await owner.get(`/api/v1/records?kind=web-strap`);
    expect(straps.status).toBe(200);
    expect(new Set(straps.json.events.map((e: { item: { tagCode: string } }) => e.item.tagCode))).toEqual(new Set([tags.strap]));
    const taggedOut = await owner.get(`/api/v1/records?status=tagged_out`);
    expect(new Set(taggedOut.json.events.map((e: { item: { tagCode: string } }) => e.item.tagCode))).toEqual(new Set([tags.tagged]));
    const one = await owner.get(`/api/v1/records?itemId=${ids.chain}`);
    expect(one.json.period).toEqual({ from: null, to: today });
    expect(one.json.total).toBe(2);
    expect(one.json.people).toEqual([{ name: "Owner Person", inspections: 1, checks: 0 }]);
    const search = await owner.get(`/api/v1/records?q=${encodeURIComponent(tags.tagged.slice(0, 6))}`);
    expect(search.json.events.every((e: { item: { tagCode: string } }) => e.item.tagCode.startsWith(tags.tagged.slice(0, 6)))).toBe(true);
  });

  it("refuse a period that ends before it starts, or a bad date, naming the field", async () => {
    const backwards = await owner.get(`/api/v1/records?from=${today}&to=${addDays(today, -1)}`);
    expect(backwards.status).toBe(400);
    expect(backwards.json.issues[0].path).toBe("from");
    const bad = await owner.get(`/api/v1/records?to=2026-02-30`);
    expect(bad.status).toBe(400);
    expect(bad.json.issues).toEqual([{ path: "to", message: "to is a date written YYYY-MM-DD" }]);
  });

  it("are for owners and designated persons: a planner and a yard hand get 403, a designated yard hand the record", async () => {
    for (const c of [planner, hand]) {
      expect((await c.get("/api/v1/records")).status).toBe(403);
      expect((await c.get("/records")).status).toBe(403);
      expect((await c.get(`/records/print?itemId=${ids.chain}`)).status).toBe(403);
    }
    expect((await inspectorHand.get("/api/v1/records?format=csv")).status).toBe(200);
    expect((await inspectorHand.get("/records")).status).toBe(200);
    expect((await new Client().get("/api/v1/records")).status).toBe(401);
  });

  it("show another organisation nothing of this one: its item is not found, its own record is empty", async () => {
    expect((await outsider.get(`/api/v1/records?itemId=${ids.chain}`)).status).toBe(404);
    expect((await outsider.get(`/records/print?itemId=${ids.chain}`)).status).toBe(404);
    const theirs = await outsider.get(`/api/v1/records?format=csv`);
    expect(theirs.text).not.toContain(tags.chain);
    const page = await outsider.get(`/records/print`);
    expect(page.status).toBe(200);
    expect(page.text).not.toContain(tags.chain);
    expect(page.text).not.toContain(orgName);
  });

  it("print with the organisation's name, the period, the inspector, the verdicts, the limits and the date printed", async () => {
    const res = await owner.get(`/records/print?from=${addDays(today, -7)}&to=${today}`);
    expect(res.status).toBe(200);
    const text = res.text.replace(/<!-- -->/g, "");
    expect(text).toContain(orgName);
    expect(text).toContain("Inspection and service record");
    expect(text).toMatch(/data-testid="period">[^<]*\(8 days\)/);
    expect(text).toContain("Periodic inspection: keep in service");
    expect(text).toContain("limit below 0.342 in for 3/8 in chain");
    expect(text).toContain("within the limit");
    expect(text).toMatch(/Owner Person<\/bdi><\/td><td class="py-1 pr-3">1<\/td>/); // one periodic inspection
    expect(text).toContain("yard_hand person");
    const printed = new RegExp(`data-testid="printed-at">${formatDay(new Date(), ZONE)} \\d{2}:\\d{2} \\(Chicago time\\)`);
    expect(text).toMatch(printed);
  });

  it("print one item's whole history from its page", async () => {
    const itemPage = await owner.get(`/items/${ids.strap}`);
    expect(itemPage.text).toContain(`href="/records/print?itemId=${ids.strap}"`);
    expect((await planner.get(`/items/${ids.strap}`)).text).not.toContain("/records/print");
    const res = await owner.get(`/records/print?itemId=${ids.strap}`);
    expect(res.status).toBe(200);
    expect(res.text.replace(/<!-- -->/g, "")).toContain(`Item ${tags.strap}`);
    expect(res.text).toContain("The whole history to");
    expect(res.text).not.toContain(tags.chain);
  });

  it(`bound a report at ${MAX_REPORT_EVENTS.toLocaleString("en-US")} entries with a 400 naming from, while the CSV streams them all`, async () => {
    const big = await newOrganisation("Big Records Co");
    const made = await big.owner.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "3/8" });
    const at = new Date(Date.now() - 3_600_000);
    const rows = Array.from({ length: MAX_REPORT_EVENTS }, () => ({ organisation_id: big.organisationId, item_id: made.json.id, type: "check", outcome: "pass", actor_id: big.userId, at }));
    for (let i = 0; i < rows.length; i += 1000) await testDb("item_events").insert(rows.slice(i, i + 1000));
    const json = await big.owner.get("/api/v1/records");
    expect(json.status).toBe(400);
    expect(json.json.issues[0].path).toBe("from");
    expect(json.json.error).toContain(`holds ${(MAX_REPORT_EVENTS + 1).toLocaleString("en-US")} entries`);
    const csv = await big.owner.get("/api/v1/records?format=csv");
    expect(csv.status).toBe(200);
    expect(csv.text.trim().split("\r\n")).toHaveLength(MAX_REPORT_EVENTS + 2); // the header, the item's creation and every check
    const printed = await big.owner.get("/records/print");
    expect(printed.status).toBe(200);
    expect(printed.text).toContain("download the CSV");
  }, 60_000);
});

describe("the audit log", () => {
  it("says who changed what, in words, filtered by kind of change and person, and exports as CSV", async () => {
    const all = await owner.get("/api/v1/audit");
    expect(all.status).toBe(200);
    expect(all.json.timeZone).toBe(ZONE);
    const retired = all.json.data.find((r: { action: string }) => r.action === "item.retired");
    expect(retired).toMatchObject({ who: "Owner Person", kind: "Stock and item details", what: "Item retired", concerning: expect.stringMatching(/^Item [0-9A-Z]{4}-[0-9A-Z]{4}: “Throat opened up”$/) });

    const inspections = await owner.get("/api/v1/audit?kind=inspections");
    expect(new Set(inspections.json.data.map((r: { kind: string }) => r.kind))).toEqual(new Set(["Checks, inspections and tag-outs"]));
    expect(inspections.json.data.map((r: { what: string }) => r.what)).toContain("Pre-use check: defects found, tagged out");

    const me = await hand.get("/api/v1/me");
    const byHand = await owner.get(`/api/v1/audit?person=${me.json.id}`);
    expect(byHand.json.data.map((r: { action: string }) => r.action).sort()).toEqual(["item.check_fail", "item.tagged_out", "person.joined"]);
    expect(byHand.json.data.every((r: { who: string }) => r.who === "yard_hand person")).toBe(true);

    const csv = await owner.get(`/api/v1/audit?kind=inspections&from=${today}&to=${today}&format=csv`);
    expect(csv.status).toBe(200);
    const { data } = Papa.parse<Record<string, string>>(csv.text.replace(/^\ufeff/, ""), { header: true, skipEmptyLines: true });
    expect(data.length).toBe(inspections.json.data.length);
    expect(data[0]).toMatchObject({ "Time zone": ZONE, "Kind of change": "Checks, inspections and tag-outs" });
    expect(data[0].When.slice(0, 10)).toBe(today);
    const tomorrowOnly = await owner.get(`/api/v1/audit?from=${addDays(today, 1)}`);
    expect(tomorrowOnly.json.data).toEqual([]);
  });

  it("refuses a period that ends before it starts, naming from", async () => {
    const res = await owner.get(`/api/v1/audit?from=${today}&to=${addDays(today, -1)}`);
    expect(res.status).toBe(400);
    expect(res.json.issues[0].path).toBe("from");
  });

  it("shows the page with its filters, and only to owners; another organisation sees none of it", async () => {
    const page = await owner.get("/audit?kind=inspections");
    expect(page.status).toBe(200);
    expect(page.text).toContain("Pre-use check: defects found, tagged out");
    expect(page.text).not.toContain("Item retired");
    for (const c of [planner, hand, inspectorHand]) {
      expect((await c.get("/api/v1/audit")).status).toBe(403);
      expect((await c.get("/audit")).status).toBe(403);
    }
    const theirs = await outsider.get("/api/v1/audit?format=csv");
    expect(theirs.text).not.toContain(tags.chain);
    expect(theirs.text).not.toContain("Owner Person,Stock");
    const theirPage = await outsider.get("/audit");
    expect(theirPage.text).not.toContain(tags.tagged);
  });
});

describe("the stock list's new filters", () => {
  it("read dates and name the field of a bad one", async () => {
    const res = await owner.get(`/api/v1/items?dueFrom=${addDays(today, 1)}&dueBy=${addDays(today, 5)}&status=in_service`);
    expect(res.json.data.map((i: { id: string }) => i.id)).toEqual([ids.dueSoon]);
    const bad = await owner.get("/api/v1/items?dueFrom=soon");
    expect(bad.status).toBe(400);
    expect(bad.json.issues).toEqual([{ path: "dueFrom", message: "dueFrom is a date written YYYY-MM-DD" }]);
    expect((await fetch(`${BASE_URL}/api/v1/items?rated=maybe`)).status).toBe(401);
  });
});

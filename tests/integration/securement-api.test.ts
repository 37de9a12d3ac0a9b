import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { hashSecret, newSecret } from "@/lib/auth/secrets";
import { SECUREMENT_CAUTION } from "@/lib/securement";
import { addMember, BASE_URL, Client, newOrganisation } from "../support/http";
import { testDb } from "../support/db";

// The public API v1 of the rated-limit engine: POST /api/v1/securement-checks and
// GET /api/v1/ratings, by session cookie and by bearer token, with the error shape.

type Role = "owner" | "planner" | "yard_hand";

const lb = (value: number) => ({ value, unit: "lb" });

/** The contract example: a 12,000 lb excavator on four direct 3/8 in grade 70 chains. */
function contractExample() {
  return {
    cargo: { weight: lb(12000), length: { value: 19, unit: "ft" }, kind: "machine" },
    tiedowns: ["front left", "front right", "rear left", "rear right"].map((label) => ({
      label,
      attachment: "direct",
      components: [
        { type: "chain", grade: 70, size: "3/8 in" },
        { type: "binder", wll: lb(6600) },
        { type: "anchor", wll: lb(6600) },
      ],
    })),
  };
}

let clients: Record<Role, Client>;
let org: Awaited<ReturnType<typeof newOrganisation>>;

/** An API token row as the settings page would write it; returns the secret. */
async function insertToken(role: Role, revoked = false): Promise<string> {
  const secret = newSecret();
  await testDb("api_tokens").insert({
    organisation_id: org.organisationId,
    created_by: org.userId,
    name: `test ${role} token`,
    role,
    token_hash: hashSecret(secret),
    revoked_at: revoked ? testDb.fn.now() : null,
  });
  return secret;
}

beforeAll(async () => {
  org = await newOrganisation("Securement API Co");
  const planner = await addMember(org.owner, "planner");
  const hand = await addMember(org.owner, "yard_hand");
  clients = { owner: org.owner, planner: planner.client, yard_hand: hand.client };
}, 60_000);

afterAll(() => testDb.destroy());

describe("POST /api/v1/securement-checks", () => {
  it("answers the contract example with the documented fields and figures", async () => {
    const res = await clients.planner.post("/api/v1/securement-checks", contractExample());
    expect(res.status).toBe(200);
    const r = res.json;
    expect(r.pass).toBe(true);
    expect(r.cargo).toEqual({ kind: "machine", weightLb: 12000, weightKg: 5443.1, lengthFt: 19, lengthM: 5.79, heavyMachine: true });
    expect(r.aggregateWllLb).toBe(13200);
    expect(r.aggregateWllKg).toBe(5987.4);
    expect(r.requiredAggregateWllLb).toBe(6000);
    expect(r.requiredAggregateWllKg).toBe(2721.6);
    expect(r.minimumTiedowns).toBe(4);
    expect(r.tiedownsCounted).toBe(4);
    expect(r.ruleSource).toBe("49 CFR 393.130(c)(1)");
    expect(r.rule).toMatch(/^49 CFR 393\.130\(c\)\(1\): /);
    expect(r.caution).toBe(SECUREMENT_CAUTION);
    expect(r.findings.filter((f: { severity: string }) => f.severity === "fail")).toEqual([]);
    expect(r.tiedowns).toHaveLength(4);
    expect(r.tiedowns[0]).toMatchObject({
      index: 0,
      label: "front left",
      attachment: "direct",
      secures: "machine",
      wllLb: 6600,
      wllKg: 2993.7,
      countedWllLb: 3300,
      countFactor: 0.5,
      limitedBy: "chain",
      limitedByIndex: 0,
      rated: true,
      countsTowardMinimum: true,
    });
    expect(r.tiedowns[0].components[0]).toMatchObject({
      index: 0,
      type: "chain",
      description: "3/8 in grade 70 chain",
      wllLb: 6600,
      tableWllKg: 2990,
      basis: "table",
      status: "verified",
    });
  });

  it("does not meet the rule when one chain has no legible grade mark and the load is heavy", async () => {
    const body = contractExample();
    body.cargo.weight = lb(24000); // needs 12,000 lb aggregate; four 3,300 lb shares give 13,200
    body.tiedowns[0].components[0] = { type: "chain", size: "3/8 in", marked: false } as never;
    const res = await clients.yard_hand.post("/api/v1/securement-checks", body);
    expect(res.status).toBe(200);
    expect(res.json.pass).toBe(false);
    expect(res.json.tiedowns[0]).toMatchObject({ wllLb: 2650, limitedBy: "chain" });
    expect(res.json.aggregateWllLb).toBe(11225);
    const codes = res.json.findings.map((f: { code: string }) => f.code);
    expect(codes).toContain("AGGREGATE_WLL_BELOW_REQUIRED");
    expect(codes).toContain("RATED_AS_UNMARKED");
    const aggregate = res.json.findings.find((f: { code: string }) => f.code === "AGGREGATE_WLL_BELOW_REQUIRED");
    expect(aggregate).toMatchObject({ severity: "fail", source: "49 CFR 393.106(d)", path: "tiedowns" });
  });

  it("answers 200 with a fail finding, not 400, for a part that cannot be rated", async () => {
    const body = contractExample();
    body.tiedowns[1].components[1] = { type: "binder" } as never; // no marked WLL
    body.tiedowns[2].components[0] = { type: "chain", grade: 70, size: "9/16 in" } as never; // not a table row
    const res = await clients.owner.post("/api/v1/securement-checks", body);
    expect(res.status).toBe(200);
    expect(res.json.pass).toBe(false);
    const missing = res.json.findings.find((f: { code: string }) => f.code === "MISSING_WLL");
    expect(missing).toMatchObject({ severity: "fail", tiedown: 1, component: 1, path: "tiedowns.1.components.1.wll" });
    const size = res.json.findings.find((f: { code: string }) => f.code === "SIZE_NOT_IN_TABLE");
    expect(size).toMatchObject({ severity: "fail", tiedown: 2, component: 0, path: "tiedowns.2.components.0.size" });
    expect(size.message).toContain("1/2 in, 5/8 in");
    expect(res.json.tiedowns[1]).toMatchObject({ wllLb: 0, rated: false, limitedBy: "binder" });
  });

  it("rates wire rope of known construction by its nominal strength, and fails a binder outside its chain-size range", async () => {
    const body = contractExample() as any;
    body.tiedowns[0].components[0] = { type: "wire-rope", size: "1/2 in", construction: "6x19 IWRC", nominalStrength: lb(26600) };
    body.tiedowns[1].components[1] = { type: "binder", wll: lb(6600), chainSizeRange: ["5/16 in", "3/8 in"] };
    body.tiedowns[1].components[0] = { type: "chain", grade: 70, size: "1/2 in" };
    const res = await clients.planner.post("/api/v1/securement-checks", body);
    expect(res.status).toBe(200);
    expect(res.json.tiedowns[0].components[0]).toMatchObject({ wllLb: 6650, basis: "unmarked-rule", source: "49 CFR 393.108(e)(1): one quarter of the nominal strength (Wire Rope Users Manual)" });
    expect(res.json.tiedowns[1]).toMatchObject({ wllLb: 0, rated: false, limitedBy: "binder" });
    const out = res.json.findings.find((f: { code: string }) => f.code === "BINDER_CHAIN_SIZE_OUT_OF_RANGE");
    expect(out).toMatchObject({ severity: "fail", tiedown: 1, component: 1, path: "tiedowns.1.components.1.chainSizeRange" });
    expect(out.message).toContain("made for 5/16 in to 3/8 in chain, but the chain (component 1) is 1/2 in");
    expect(res.json.pass).toBe(false);
  });

  describe("answers 400 with the exact path of bad input", () => {
    const cases: Array<{ name: string; body: (b: any) => unknown; path: string; message?: RegExp }> = [
      { name: "missing cargo", body: (b) => ({ tiedowns: b.tiedowns }), path: "cargo" },
      { name: "missing tiedowns", body: (b) => ({ cargo: b.cargo }), path: "tiedowns" },
      { name: "negative weight", body: (b) => ({ ...b, cargo: { ...b.cargo, weight: lb(-9800) } }), path: "cargo.weight.value", message: /greater than 0/ },
      { name: "weight that is not a number", body: (b) => ({ ...b, cargo: { ...b.cargo, weight: { value: "9800", unit: "lb" } } }), path: "cargo.weight.value", message: /must be a number/ },
      { name: "unknown weight unit", body: (b) => ({ ...b, cargo: { ...b.cargo, weight: { value: 5, unit: "tons" } } }), path: "cargo.weight.unit", message: /lb, kg or daN/ },
      { name: "unknown length unit", body: (b) => ({ ...b, cargo: { ...b.cargo, length: { value: 19, unit: "yd" } } }), path: "cargo.length.unit", message: /in, ft, mm or m/ },
      { name: "unknown cargo kind", body: (b) => ({ ...b, cargo: { ...b.cargo, kind: "vehicle" } }), path: "cargo.kind" },
      {
        name: "bad attachment",
        body: (b) => ({ ...b, tiedowns: [{ ...b.tiedowns[0], attachment: "sideways" }, ...b.tiedowns.slice(1)] }),
        path: "tiedowns.0.attachment",
        message: /direct, indirect-same-side or indirect-across/,
      },
      {
        name: "tiedown without components",
        body: (b) => ({ ...b, tiedowns: [...b.tiedowns.slice(0, 2), { ...b.tiedowns[2], components: [] }, b.tiedowns[3]] }),
        path: "tiedowns.2.components",
        message: /at least one component/,
      },
      {
        name: "component without a type",
        body: (b) => withComponent(b, 0, 2, { wll: lb(6600) }),
        path: "tiedowns.0.components.2.type",
      },
      {
        name: "component WLL without its unit",
        body: (b) => withComponent(b, 0, 1, { type: "binder", wll: { value: 5400 } }),
        path: "tiedowns.0.components.1.wll.unit",
      },
      {
        name: "component WLL given as bare text",
        body: (b) => withComponent(b, 0, 1, { type: "binder", wll: "5400 lb" }),
        path: "tiedowns.0.components.1.wll",
      },
      {
        name: "size that cannot be read",
        body: (b) => withComponent(b, 3, 0, { type: "chain", grade: 70, size: "three-eighths" }),
        path: "tiedowns.3.components.0.size",
        message: /Cannot read this size/,
      },
      {
        name: "grade that cannot be read",
        body: (b) => withComponent(b, 1, 0, { type: "chain", grade: "alloy", size: "3/8" }),
        path: "tiedowns.1.components.0.grade",
      },
      {
        name: "misspelt field (strict objects)",
        body: (b) => withComponent(b, 0, 1, { type: "binder", wl: lb(5400) }),
        path: "tiedowns.0.components.1.wl",
        message: /Unknown field "wl"/,
      },
      {
        name: "tiedown that secures an accessory not declared",
        body: (b) => ({ ...b, tiedowns: [...b.tiedowns, { ...b.tiedowns[0], secures: "bucket" }] }),
        path: "tiedowns.4.secures",
        message: /not a declared accessory/,
      },
    ];
    for (const c of cases) {
      it(c.name, async () => {
        const res = await clients.planner.post("/api/v1/securement-checks", c.body(contractExample()));
        expect(res.status).toBe(400);
        expect(res.json.error).toBe("Some fields need fixing.");
        const paths = res.json.issues.map((i: { path: string }) => i.path);
        expect(paths).toContain(c.path);
        const issue = res.json.issues.find((i: { path: string }) => i.path === c.path);
        expect(typeof issue.message).toBe("string");
        if (c.message) expect(issue.message).toMatch(c.message);
      });
    }

    it("a body that is not JSON", async () => {
      const res = await clients.planner.request("POST", "/api/v1/securement-checks", "{not json", { "content-type": "application/json" });
      expect(res.status).toBe(400);
      expect(res.json).toEqual({ error: "The request body is not valid JSON.", issues: [] });
    });
  });

  it("answers 401 without a session or token, and with an unknown or revoked token", async () => {
    const anonymous = await new Client().post("/api/v1/securement-checks", contractExample());
    expect(anonymous.status).toBe(401);
    expect(anonymous.json).toEqual({ error: "Sign in first.", issues: [] });
    expect((await new Client("not-a-token").post("/api/v1/securement-checks", contractExample())).status).toBe(401);
    const revoked = await insertToken("planner", true);
    expect((await new Client(revoked).post("/api/v1/securement-checks", contractExample())).status).toBe(401);
  });

  it("works with a bearer token, with no Origin header", async () => {
    const token = await insertToken("yard_hand");
    const res = await fetch(`${BASE_URL}/api/v1/securement-checks`, {
      method: "POST",
      headers: { authorization: `Bearer ${token}`, "content-type": "application/json" },
      body: JSON.stringify(contractExample()),
    });
    expect(res.status).toBe(200);
    const json = await res.json();
    expect(json.aggregateWllLb).toBe(13200);
    const row = await testDb("api_tokens").where({ token_hash: hashSecret(token) }).first("last_used_at");
    expect(row.last_used_at).not.toBeNull();
  });

  it("refuses a cookie-borne check from another site", async () => {
    const res = await clients.owner.post("/api/v1/securement-checks", contractExample(), { origin: "https://elsewhere.example" });
    expect(res.status).toBe(403);
  });

  for (const role of ["owner", "planner", "yard_hand"] as const) {
    it(`lets a ${role} check`, async () => {
      const res = await clients[role].post("/api/v1/securement-checks", contractExample());
      expect(res.status).toBe(200);
      expect(res.json.pass).toBe(true);
    });
  }
});

function withComponent(b: any, tiedown: number, component: number, value: unknown) {
  const tiedowns = b.tiedowns.map((t: any, i: number) =>
    i === tiedown ? { ...t, components: t.components.map((c: unknown, j: number) => (j === component ? value : c)) } : t,
  );
  return { ...b, tiedowns };
}

describe("GET /api/v1/ratings", () => {
  const get = (query: string, who: Client = clients.yard_hand) => who.get(`/api/v1/ratings?${query}`);

  it("reads 3/8 in grade 70 chain from the chain table", async () => {
    const res = await get("material=chain&grade=70&size=3/8%20in");
    expect(res.status).toBe(200);
    expect(res.json).toEqual({
      material: "chain",
      wllLb: 6600,
      wllKg: 2990,
      source: "49 CFR 393.108, chain table",
      status: "verified",
      basis: "table",
      grade: 70,
      row: "10 (3/8)",
      size: "3/8 in",
    });
  });

  it("reads the trade's ways of writing a size and a grade", async () => {
    for (const q of ["material=chain&grade=G7&size=3%2F8", "material=chain&grade=700&size=0.375", "material=chain&grade=70&size=10%20mm"]) {
      const res = await get(q);
      expect(res.status, q).toBe(200);
      expect(res.json.wllLb, q).toBe(6600);
    }
  });

  it("rates chain with no grade as grade 30 proof coil (49 CFR 393.108(d))", async () => {
    const res = await get("material=chain&size=5/16");
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ material: "chain", wllLb: 1900, wllKg: 860, grade: 30, basis: "unmarked-rule", size: "5/16 in" });
    expect(res.json.rule).toMatch(/^49 CFR 393\.108\(d\)/);
  });

  it("reads webbing by width, rope by fibre and size, steel strapping by width and thickness", async () => {
    expect((await get("material=webbing&width=4%20in")).json).toMatchObject({ wllLb: 4000, wllKg: 1810, source: "49 CFR 393.108, synthetic webbing table" });
    const nylon = await get("material=rope&fibre=nylon&size=1/2");
    expect(nylon.json).toMatchObject({ material: "rope", fibre: "nylon", wllLb: 525, basis: "table", status: "verified" }); // 1994 final rule's table
    const unlabelled = await get("material=rope&size=1/2");
    expect(unlabelled.json).toMatchObject({ fibre: "polypropylene", basis: "unmarked-rule" });
    const strap = await get("material=steel-strapping&width=1%201/4&thickness=0.029");
    expect(strap.json).toMatchObject({ wllLb: 1190, wllKg: 540, status: "verified" });
    expect((await get("material=wire-rope&size=1/2")).json).toMatchObject({ wllLb: 5300 });
  });

  it("answers the corrected rows and says how it read a query (49 CFR 393.108; 1994 final rule's table)", async () => {
    expect((await get("material=wire-rope&size=7/8")).json).toMatchObject({ wllLb: 16100, wllKg: 7300, status: "verified" });
    expect((await get("material=wire-rope&size=25%20mm")).json).toMatchObject({ wllLb: 20900, wllKg: 9480, status: "verified" });
    expect((await get("material=rope&fibre=manila&size=13%20mm")).json).toMatchObject({ wllLb: 315, wllKg: 150, row: "13 (1/2)", status: "verified" });
    const twelve = await get("material=rope&fibre=manila&size=12%20mm");
    expect(twelve.status).toBe(404);
    expect(twelve.json.nearest).toEqual(["11 mm (7/16 in)", "13 mm (1/2 in)"]);
    const g40 = await get("material=chain&grade=G40&size=3/8");
    expect(g40.json).toMatchObject({ grade: 43, wllLb: 5400, notes: ['Grade mark "G40" is read as grade 43: grade 43 (high test) chain is also stamped 4, 40 or 400'] });
    expect((await get("material=rope&size=1/2")).json.notes).toEqual([
      "Rated as polypropylene (49 CFR 393.108(c)): 625 lb (280 kg). If it is manila (natural fibre), 49 CFR 393.108(f) rates it lower: 315 lb (150 kg)",
    ]);
    expect((await get("material=rope&fibre=double-braided-nylon&size=1/2")).json).toMatchObject({ wllLb: 655, status: "from-memory" });
  });

  it("answers 404 naming the nearest sizes for a size the table does not have", async () => {
    const res = await get("material=chain&grade=70&size=9/16");
    expect(res.status).toBe(404);
    expect(res.json).toEqual({
      error: "Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in",
      issues: [{ path: "size", message: "Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in" }],
      code: "SIZE_NOT_IN_TABLE",
      nearest: ["1/2 in", "5/8 in"],
    });
    const g80 = await get("material=chain&grade=80&size=7/16");
    expect(g80.status).toBe(404);
    expect(g80.json.nearest).toEqual(["3/8 in", "1/2 in"]);
    const width = await get("material=webbing&width=1");
    expect(width.status).toBe(404);
    expect(width.json.issues[0].path).toBe("width");
  });

  it("answers 404 for a grade that is not a column of the chain table", async () => {
    const res = await get("material=chain&grade=120&size=3/8");
    expect(res.status).toBe(404);
    expect(res.json).toMatchObject({ code: "UNKNOWN_GRADE", issues: [{ path: "grade" }], nearest: [] });
  });

  it("answers 400 for an unknown material, a missing or unreadable size, an unknown fibre or field", async () => {
    const cases: Array<[string, string]> = [
      ["material=unobtanium&size=3/8", "material"],
      ["size=3/8", "material"],
      ["material=chain&grade=70", "size"],
      ["material=chain&grade=70&size=huge", "size"],
      ["material=steel-strapping&width=2", "thickness"],
      ["material=rope&fibre=hemp&size=1/2", "fibre"],
      ["material=chain&grade=70&size=3/8&colour=red", "colour"],
    ];
    for (const [q, path] of cases) {
      const res = await get(q);
      expect(res.status, q).toBe(400);
      expect(res.json.error, q).toBe("Some fields need fixing.");
      expect(res.json.issues.map((i: { path: string }) => i.path), q).toContain(path);
    }
  });

  it("answers 401 without a session or token, and works with a bearer token", async () => {
    const res = await new Client().get("/api/v1/ratings?material=chain&grade=70&size=3/8");
    expect(res.status).toBe(401);
    const token = await insertToken("planner");
    const ok = await new Client(token).get("/api/v1/ratings?material=chain&grade=70&size=3/8");
    expect(ok.status).toBe(200);
    expect(ok.json.wllLb).toBe(6600);
  });

  for (const role of ["owner", "planner", "yard_hand"] as const) {
    it(`lets a ${role} look up a rating`, async () => {
      const res = await get("material=chain&grade=70&size=3/8", clients[role]);
      expect(res.status).toBe(200);
      expect(res.json.wllLb).toBe(6600);
    });
  }
});

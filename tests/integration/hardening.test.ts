import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { callAction, discoveredActions } from "../support/actions";
import { countRows, testDb } from "../support/db";
import { machineBody } from "../support/fleet";
import { addMember, BASE_URL, Client, linkIn, mailsTo, newOrganisation, TEST_PASSWORD, uniqueEmail } from "../support/http";

// The fixes of the hardening issue (issue 11), one block per numbered item, each written
// as the attack that worked before the fix. Item 2 (forwarded addresses) is forwarded.test.ts;
// the faults (PostgreSQL and the file store stopped) are tests/faults/.

let org: Awaited<ReturnType<typeof newOrganisation>>;

beforeAll(async () => {
  org = await newOrganisation("Hardening Co");
}, 60_000);
afterAll(() => testDb.destroy());

/** Waits until `count` e-mails to an address carry a link to `path`, and answers them, oldest first. */
async function waitForMails(address: string, count: number, path: string): Promise<{ text: string }[]> {
  for (let i = 0; i < 100; i++) {
    const mine = (await mailsTo(address)).filter((m) => m.text.includes(`${path}/`));
    if (mine.length >= count) return mine;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`fewer than ${count} e-mails with ${path} to ${address}`);
}

describe("issue 11.4: a reset ends every outstanding reset link of that person", () => {
  it("an older link no longer works once a newer one was used", async () => {
    const { email } = await newOrganisation();
    const anyone = new Client();
    expect((await anyone.post("/api/v1/password-resets", { email })).status).toBe(202);
    expect((await anyone.post("/api/v1/password-resets", { email })).status).toBe(202);
    const [first, second] = (await waitForMails(email, 2, "/reset-password")).map((m) => linkIn(m.text, "/reset-password"));
    expect(first).not.toBe(second);
    expect((await anyone.post("/api/v1/password-resets/confirm", { token: second, password: "the-second-new-password" })).status).toBe(200);
    const old = await anyone.post("/api/v1/password-resets/confirm", { token: first, password: "an-attacker-password" });
    expect(old.status).toBe(410);
    expect(old.json.error).toBe("This reset link has already been used. Ask for a new one.");
    expect((await new Client().post("/api/v1/sessions", { email, password: "the-second-new-password" })).status).toBe(200);
  });
});

describe("issue 11.5: two owners demoting each other at once leave one owner", () => {
  it("exactly one of two simultaneous demotions wins, every time", async () => {
    for (let round = 0; round < 12; round++) {
      const a = await newOrganisation(`Race ${round}`);
      const b = await addMember(a.owner, "owner");
      const [ab, ba] = await Promise.all([
        a.owner.patch(`/api/v1/people/${b.userId}`, { role: "planner" }),
        b.client.patch(`/api/v1/people/${a.userId}`, { role: "planner" }),
      ]);
      // The loser is refused: 400 when both counted at once (the last owner), or 403 when the
      // winner's change came first and the loser is no longer an owner.
      expect([ab.status, ba.status].filter((s) => s === 200), `round ${round}: ${ab.status} ${ab.text} / ${ba.status} ${ba.text}`).toHaveLength(1);
      const loser = ab.status === 200 ? ba : ab;
      expect([400, 403]).toContain(loser.status);
      expect(await countRows("users", { organisation_id: a.organisationId, role: "owner", disabled_at: null })).toBe(1);
    }
  }, 120_000);
});

describe("issue 11.6: mail-sending endpoints are limited, and names carry no control characters", () => {
  it("limits password resets per e-mail address", async () => {
    const email = uniqueEmail("reset-limit");
    for (let i = 0; i < 3; i++) expect((await new Client().post("/api/v1/password-resets", { email })).status).toBe(202);
    const limited = await new Client().post("/api/v1/password-resets", { email });
    expect(limited.status).toBe(429);
    expect(limited.json.error).toMatch(/Too many reset requests for this e-mail address/);
  });

  it("limits password resets per client address", async () => {
    const caller = new Client();
    for (let i = 0; i < 10; i++) expect((await caller.post("/api/v1/password-resets", { email: uniqueEmail("many") })).status).toBe(202);
    const limited = await caller.post("/api/v1/password-resets", { email: uniqueEmail("many") });
    expect(limited.status).toBe(429);
    expect(limited.json.error).toMatch(/Too many reset requests from this address/);
  });

  it("limits sign-ups per client address", async () => {
    const caller = new Client();
    const body = () => ({ organisationName: "Flood Co", name: "Flood", email: uniqueEmail("flood"), password: TEST_PASSWORD });
    for (let i = 0; i < 10; i++) expect((await caller.post("/api/v1/signups", body())).status).toBe(202);
    const limited = await caller.post("/api/v1/signups", body());
    expect(limited.status).toBe(429);
    expect(limited.json.error).toMatch(/Too many sign-ups from this address/);
  });

  it("limits invites per recipient and per inviting account", async () => {
    const email = uniqueEmail("invitee");
    for (let i = 0; i < 3; i++) {
      const inviter = (await newOrganisation()).owner;
      expect((await inviter.post("/api/v1/invites", { email, role: "planner" })).status).toBe(201);
    }
    const fourth = await (await newOrganisation()).owner.post("/api/v1/invites", { email, role: "planner" });
    expect(fourth.status).toBe(429);
    expect(fourth.json.error).toMatch(/Too many invites to this e-mail address/);

    const busy = (await newOrganisation()).owner;
    for (let i = 0; i < 20; i++) expect((await busy.post("/api/v1/invites", { email: uniqueEmail("crew"), role: "yard_hand" })).status).toBe(201);
    const limited = await busy.post("/api/v1/invites", { email: uniqueEmail("crew"), role: "yard_hand" });
    expect(limited.status).toBe(429);
    expect(limited.json.error).toMatch(/Too many invites from your account/);
  }, 60_000);

  it("refuses line breaks and other control characters in organisation and person names", async () => {
    const base = { organisationName: "Line Co", name: "Lina", email: uniqueEmail(), password: TEST_PASSWORD };
    const org = await new Client().post("/api/v1/signups", { ...base, organisationName: "Line Co\nBcc: everyone@example.com" });
    expect(org.status).toBe(400);
    expect(org.json.issues).toEqual([{ path: "organisationName", message: "Use letters, numbers and punctuation only: no line breaks or control characters." }]);
    const person = await new Client().post("/api/v1/signups", { ...base, name: "Lina\u0007" });
    expect(person.status).toBe(400);
    expect(person.json.issues[0].path).toBe("name");
    expect(await countRows("users", { email: base.email })).toBe(0);
  });

  it("refuses names made only of invisible or direction-override characters", async () => {
    const res = await new Client().post("/api/v1/signups", {
      organisationName: "Ghost Co", name: "\u200b\u202e\u2066\u00a0", email: uniqueEmail(), password: TEST_PASSWORD,
    });
    expect(res.status).toBe(400);
    expect(res.json.issues).toEqual([{ path: "name", message: "Enter a name with letters or numbers in it." }]);
  });

  it("shows names inside <bdi>, so a direction override cannot spill into the text around it", async () => {
    const tricky = "Eve \u202egnp.exe";
    const member = await addMember(org.owner, "planner");
    await testDb("users").where({ id: member.userId }).update({ name: tricky });
    const page = await org.owner.get("/people");
    expect(page.status).toBe(200);
    expect(page.text).toContain(`<bdi>${tricky}</bdi>`);
  });
});

describe("issue 11.7: weak passwords are refused", () => {
  const signUp = (email: string, password: string) =>
    new Client().post("/api/v1/signups", { organisationName: "Weak Co", name: "Wes", email, password });

  it("refuses a password found in a list of common passwords", async () => {
    for (const password of ["1234567890", "qwertyuiop", "QWERTYUIOP"]) {
      const email = uniqueEmail();
      const res = await signUp(email, password);
      expect(res.status, password).toBe(400);
      expect(res.json.issues).toEqual([{ path: "password", message: "This password is on a list of common passwords. Choose one that is harder to guess." }]);
      expect(await countRows("users", { email })).toBe(0);
    }
  });

  it("refuses a password equal to the e-mail address", async () => {
    const email = uniqueEmail();
    const res = await signUp(email, email.toUpperCase());
    expect(res.status).toBe(400);
    expect(res.json.issues).toEqual([{ path: "password", message: "The password must not be your e-mail address." }]);
  });

  it("applies the same rules when an invite is accepted and when a password is reset", async () => {
    const email = uniqueEmail("invited");
    expect((await org.owner.post("/api/v1/invites", { email, role: "planner" })).status).toBe(201);
    const token = linkIn((await waitForMails(email, 1, "/invite"))[0].text, "/invite");
    const accept = await new Client().post("/api/v1/invites/accept", { token, name: "Ivy", password: email });
    expect(accept.status).toBe(400);
    expect(accept.json.issues[0].path).toBe("password");
    const common = await new Client().post("/api/v1/invites/accept", { token, name: "Ivy", password: "1234567890" });
    expect(common.status).toBe(400);

    const { email: ownerEmail } = await newOrganisation();
    expect((await new Client().post("/api/v1/password-resets", { email: ownerEmail })).status).toBe(202);
    const reset = linkIn((await waitForMails(ownerEmail, 1, "/reset-password"))[0].text, "/reset-password");
    const same = await new Client().post("/api/v1/password-resets/confirm", { token: reset, password: ownerEmail });
    expect(same.status).toBe(400);
    expect(same.json.issues).toEqual([{ path: "password", message: "The password must not be your e-mail address." }]);
  });
});

describe("issue 11.8: JSON input is taken as typed, bounded and checked", () => {
  const chain = { kind: "chain", marking: "wll", size: "3/8" };

  it("takes JSON numbers only as numbers: true, [5] and \"5\" are refused, not coerced", async () => {
    for (const value of [true, [5], "5"]) {
      const before = await countRows("items", { organisation_id: org.organisationId });
      const res = await org.owner.post("/api/v1/items", { ...chain, markedWll: { value, unit: "lb" } });
      expect(res.status, JSON.stringify(value)).toBe(400);
      expect(res.json.issues).toEqual([{ path: "markedWll.value", message: "Enter the WLL as a number." }]);
      expect(await countRows("items", { organisation_id: org.organisationId })).toBe(before);
    }
    const cost = await org.owner.post("/api/v1/items", { ...chain, markedWll: { value: 5000, unit: "lb" }, costCents: "100" });
    expect(cost.status).toBe(400);
    expect(cost.json.issues[0].path).toBe("costCents");
    const ok = await org.owner.post("/api/v1/items", { ...chain, markedWll: { value: 5000, unit: "lb" }, costCents: 2500 });
    expect(ok.status).toBe(201);
  });

  it("takes a machine's or trailer's quantities as JSON numbers only", async () => {
    for (const value of [true, [5], "12000"]) {
      const before = await countRows("machines", { organisation_id: org.organisationId });
      const res = await org.owner.post("/api/v1/machines", machineBody({ weight: { value, unit: "lb" } }));
      expect(res.status, JSON.stringify(value)).toBe(400);
      expect(res.json.issues).toEqual([{ path: "weight.value", message: "Enter the shipping weight as a number." }]);
      expect(await countRows("machines", { organisation_id: org.organisationId })).toBe(before);
    }
    expect((await org.owner.post("/api/v1/machines", machineBody())).status).toBe(201);
  });

  it("answers an in-service date far in the future with 400 naming the field", async () => {
    const res = await org.owner.post("/api/v1/items", { ...chain, markedWll: { value: 5000, unit: "lb" }, inServiceOn: "9999-12-31" });
    expect(res.status).toBe(400);
    expect(res.json.issues).toEqual([{ path: "inServiceOn", message: expect.stringMatching(/^The in-service date cannot be after/) }]);
  });

  it("answers a PATCH with only unknown keys with 400 naming them", async () => {
    const member = await addMember(org.owner, "yard_hand");
    const res = await org.owner.patch(`/api/v1/people/${member.userId}`, { colour: "red" });
    expect(res.status).toBe(400);
    expect(res.json.issues).toEqual([{ path: "colour", message: "colour is not a field that can be changed here." }]);
    const notAnId = await org.owner.patch("/api/v1/people/not-an-id", { role: "planner" });
    expect(notAnId.status).toBe(404);
  });

  it("caps every JSON body: a huge sign-in is 413 in words", async () => {
    const res = await new Client().post("/api/v1/sessions", { email: "a@b.example", password: "x".repeat(2 * 1024 * 1024) });
    expect(res.status).toBe(413);
    expect(res.json.error).toMatch(/^The request is too large/);
    const big = await org.owner.post("/api/v1/items", { ...chain, markedWll: { value: 5000, unit: "lb" }, serial: "x".repeat(300 * 1024) });
    expect(big.status).toBe(413);
  });
});

describe("issue 11.9: cross-site requests are refused on the whole origin", () => {
  it("refuses a server action posted with a session cookie and no Origin with 403", async () => {
    const action = discoveredActions().get("app/(app)/people/actions.ts#inviteAction")!;
    const before = await countRows("invites", { organisation_id: org.organisationId });
    const form = new FormData();
    form.append("_1_email", uniqueEmail());
    form.append("_1_role", "planner");
    form.append("0", JSON.stringify([{}, "$K1"]));
    const res = await fetch(BASE_URL + action.page, { method: "POST", body: form, headers: { cookie: org.owner.cookie, "next-action": action.id }, redirect: "manual" });
    expect(res.status).toBe(403);
    expect(await countRows("invites", { organisation_id: org.organisationId })).toBe(before);
  });

  it("refuses an API mutation whose Origin differs from APP_URL in scheme or port", async () => {
    const url = new URL(BASE_URL);
    for (const origin of [`https://${url.host}`, `${url.protocol}//${url.hostname}:1`]) {
      const res = await org.owner.post("/api/v1/invites", { email: uniqueEmail(), role: "planner" }, { origin });
      expect(res.status, origin).toBe(403);
      expect(res.json.error).toBe("Cross-site request refused.");
    }
  });

  it("does not believe a client's X-Forwarded-Host", async () => {
    const res = await org.owner.post("/api/v1/invites", { email: uniqueEmail(), role: "planner" }, { origin: "http://evil.example", "x-forwarded-host": "evil.example" });
    expect(res.status).toBe(403);
  });
});

describe("issue 11.10: security headers", () => {
  it("sends a Content-Security-Policy with a nonce on every page, which Next's scripts carry", async () => {
    for (const [page, client] of [["/sign-in", new Client()], ["/stock", org.owner], ["/scan", org.owner]] as const) {
      const res = await client.get(page);
      expect(res.status, page).toBe(200);
      const csp = res.headers.get("content-security-policy") ?? "";
      const nonce = csp.match(/'nonce-([A-Za-z0-9+/=]+)'/)?.[1];
      expect(nonce, page).toBeTruthy();
      expect(csp).toContain("frame-ancestors 'none'");
      expect(csp).toContain("object-src 'none'");
      const scripts = [...res.text.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
      expect(scripts.length).toBeGreaterThan(0);
      for (const tag of scripts) expect(tag, page).toContain(`nonce="${nonce}"`);
    }
    const a = (await org.owner.get("/stock")).headers.get("content-security-policy");
    const b = (await org.owner.get("/stock")).headers.get("content-security-policy");
    expect(a).not.toBe(b); // a new nonce per answer
  });

  it("answers authenticated API calls with Cache-Control: no-store", async () => {
    for (const p of ["/api/v1/me", "/api/v1/items", "/api/v1/yards"]) {
      const res = await org.owner.get(p);
      expect(res.status, p).toBe(200);
      expect(res.headers.get("cache-control"), p).toBe("no-store");
    }
  });

  it("serves attachments sandboxed and as attachments of their own name", async () => {
    const item = await org.owner.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "3/8" });
    const action = discoveredActions().get("app/(app)/items/[id]/actions.ts#certificateAction")!;
    const pdf = new File([Buffer.from("%PDF-1.4\n% certificate\n")], "cert (one).pdf", { type: "application/pdf" });
    await callAction(org.owner, { ...action, page: `/items/${item.json.id}` }, { itemId: item.json.id, certificate: pdf });
    const row = await testDb("attachments").where({ item_id: item.json.id }).first("id");
    const res = await org.owner.get(`/api/v1/attachments/${row.id}`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-security-policy")).toBe("sandbox");
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="cert _one_.pdf"`);
    expect(res.headers.get("cache-control")).toBe("no-store");
  });
});

describe("issue 11.11: /t/{code} does not tell a stranger whether a code exists", () => {
  it("answers an unknown code and a real private one alike", async () => {
    const real = await org.owner.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "3/8" });
    const { newTagCode } = await import("@/lib/tags/code");
    const unknown = newTagCode();
    const look = async (code: string) => {
      const res = await fetch(`${BASE_URL}/t/${code}`, { redirect: "manual", headers: { "x-forwarded-for": "198.18.11.11" } });
      const body = (await res.text()).replaceAll(code, "CODE").replace(/nonce(=\\?"|\\?":\\?")[A-Za-z0-9+/=]+/g, "nonce=N"); // a fresh nonce per answer
      return { status: res.status, location: res.headers.get("location")?.replace(code, "CODE"), body };
    };
    const a = await look(real.json.tagCode);
    const b = await look(unknown);
    expect(a.status).toBe(307);
    expect(b).toEqual(a);
  });
});

describe("issue 11.12: a CSV file's encoding is decided on the whole file", () => {
  it("reads a Windows-1252 file whose first accented letter comes after byte 1,000", async () => {
    const lines = ["Kind,Grade,Size,Serial"];
    for (let i = 0; lines.join("\n").length < 1200; i++) lines.push(`chain,70,3/8,PLAIN-${i}`);
    lines.push("chain,70,3/8,LOT-Crécy-1");
    const bytes = Buffer.from(lines.join("\n") + "\n", "latin1"); // é is one byte, 0xE9
    expect(bytes.indexOf(0xe9)).toBeGreaterThan(1000);
    const form = new FormData();
    form.append("file", new Blob([bytes], { type: "text/csv" }), "old-sheet.csv");
    const res = await org.owner.post("/api/v1/imports", form);
    expect(res.status).toBe(201);
    expect(res.json.encoding).toBe("Windows-1252 (older spreadsheet text)");
    const stored = await testDb("items").where({ import_batch_id: res.json.batchId }).where("serial", "like", "LOT-%").first("serial");
    expect(stored.serial).toBe("LOT-Crécy-1");
  });
});

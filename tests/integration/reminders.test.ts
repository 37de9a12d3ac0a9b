import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { unsubscribeToken } from "@/lib/mail/unsubscribe";
import { addDays, todayIn } from "@/lib/time";
import { callAction, discoveredActions } from "../support/actions";
import { countRows, testDb } from "../support/db";
import { anchorId, day, makeKit, makeMachine, makeTrailer } from "../support/fleet";
import { addMember, BASE_URL, Client, latestMailTo, mailSource, mailsTo, newOrganisation, type MailItem } from "../support/http";
import { QUEUES, sendTestJob, sleep, waitFor } from "../support/services";

// Reminders: tag-outs at once to owners and designated people, kit notices to planners, the
// daily digest at the organisation's time, each person's choices and one-click unsubscribe.

type Org = Awaited<ReturnType<typeof newOrganisation>>;
type Member = Awaited<ReturnType<typeof addMember>>;
let org: Org;
let designated: Member;
let planner: Member;
let hand: Member;

beforeAll(async () => {
  org = await newOrganisation("Reminder Co");
  designated = await addMember(org.owner, "yard_hand", true);
  planner = await addMember(org.owner, "planner");
  hand = await addMember(org.owner, "yard_hand");
}, 60_000);

afterAll(() => testDb.destroy());

async function newChain(): Promise<{ id: string; tagCode: string }> {
  const res = await org.owner.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "3/8" });
  expect(res.status).toBe(201);
  return res.json;
}

async function tagOut(itemId: string, note: string) {
  const res = await hand.client.post(`/api/v1/items/${itemId}/events`, { type: "tag_out", note });
  expect(res.status).toBe(201);
}

/** Who was sent e-mail of a kind about a subject, from the message rows. */
async function recipientsOf(kind: string, subject: RegExp): Promise<string[]> {
  const rows = await testDb("mail_messages").where({ organisation_id: org.organisationId, kind }).select("to_address", "subject");
  return rows.filter((r) => subject.test(r.subject)).map((r) => r.to_address).sort();
}

const unsubscribePath = (mail: MailItem) => mail.text.match(/\/unsubscribe\/([A-Za-z0-9_-]+\.[a-z_]+\.[A-Za-z0-9_-]+)/)![1];

describe("a tag-out", () => {
  it("e-mails the owners and designated people at once, each with their own one-click unsubscribe, and no one else", async () => {
    const item = await newChain();
    await tagOut(item.id, "Link stretched");
    const subject = new RegExp(`^Tagged out: .*${item.tagCode}`);
    const toOwner = await latestMailTo(org.email, { subject });
    const toDesignated = await latestMailTo(designated.email, { subject });
    expect(toOwner.text).toContain("Link stretched");
    expect(await recipientsOf("tag_out", subject)).toEqual([org.email, designated.email].sort());
    expect(await mailsTo(planner.email).then((m) => m.filter((x) => subject.test(x.subject)))).toEqual([]);

    const source = await mailSource(toOwner.id);
    const token = unsubscribePath(toOwner);
    expect(source).toContain(`List-Unsubscribe:`);
    expect(source.replace(/\r?\n\s+/g, " ")).toContain(`<${BASE_URL}/api/v1/unsubscribe/${token}>`);
    expect(source).toContain("List-Unsubscribe-Post: List-Unsubscribe=One-Click");
    expect(unsubscribePath(toDesignated)).not.toBe(token);
  });

  it("tells the planners when it takes an item out of a kit for tomorrow", async () => {
    const machine = await makeMachine(org.owner);
    const trailer = await makeTrailer(org.owner);
    const kit = await makeKit(org.owner, { date: day(1), machineId: machine.id, trailerId: trailer.id, job: "Culvert on Birch Rd" });
    const chain = await newChain();
    const tied = await org.owner.post(`/api/v1/kits/${kit.id}/tiedowns`, { anchorPointId: anchorId(trailer, "FL"), attachment: "direct", secures: "machine", machinePoint: "front left", itemIds: [chain.id] });
    expect(tied.status).toBe(201);

    await tagOut(chain.id, "Gouged link");
    const subject = new RegExp(`^Kit for Culvert on Birch Rd (tomorrow|today) lost an item: ${chain.tagCode} tagged out$`);
    const mail = await latestMailTo(planner.email, { subject });
    expect(mail.text).toContain(`/kits/${kit.id}`);
    expect(mail.text).toContain("Note: Gouged link");
    expect(await recipientsOf("kit", subject)).toEqual([org.email, planner.email].sort());
  });
});

describe("unsubscribing", () => {
  it("works from the e-mail's link with no sign-in, for its own kind and person only", async () => {
    const first = await newChain();
    await tagOut(first.id, "Hook opened");
    const mail = await latestMailTo(org.email, { subject: new RegExp(first.tagCode) });
    const token = unsubscribePath(mail);
    const stranger = new Client();

    // Opening the page, or the header's address, changes nothing.
    const page = await stranger.get(`/unsubscribe/${token}`);
    expect(page.status).toBe(200);
    expect(page.text).toContain("Stop tag-out e-mails?");
    expect(page.text).toContain(org.email);
    const opened = await stranger.get(`/api/v1/unsubscribe/${token}`);
    expect(opened.status).toBe(303);
    expect(opened.headers.get("location")).toBe(`/unsubscribe/${token}`);
    expect(await countRows("mail_opt_outs", { user_id: org.userId })).toBe(0);

    // A forged or altered token does nothing.
    const forged = token.replace(".tag_out.", ".digest.");
    const refused = await fetch(`${BASE_URL}/api/v1/unsubscribe/${forged}`, { method: "POST", headers: { "content-type": "application/x-www-form-urlencoded" }, body: "List-Unsubscribe=One-Click" });
    expect(refused.status).toBe(404);
    expect((await stranger.get(`/unsubscribe/${forged}`)).text).toContain("This link cannot be used");

    // A mail program's one-click POST (RFC 8058): no cookie, no Origin.
    const oneClick = await fetch(`${BASE_URL}/api/v1/unsubscribe/${token}`, { method: "POST", headers: { "content-type": "application/x-www-form-urlencoded" }, body: "List-Unsubscribe=One-Click" });
    expect(oneClick.status).toBe(200);
    expect((await testDb("mail_opt_outs").where({ user_id: org.userId }).select("kind")).map((r) => r.kind)).toEqual(["tag_out"]);
    expect(await countRows("mail_opt_outs", { user_id: designated.userId })).toBe(0);
    expect(await countRows("audit_log", { organisation_id: org.organisationId, action: "mail.unsubscribed", actor_id: org.userId })).toBe(1);
    // Twice is the same as once.
    expect((await fetch(`${BASE_URL}/api/v1/unsubscribe/${token}`, { method: "POST", body: "List-Unsubscribe=One-Click", headers: { "content-type": "application/x-www-form-urlencoded" } })).status).toBe(200);
    expect(await countRows("audit_log", { organisation_id: org.organisationId, action: "mail.unsubscribed", actor_id: org.userId })).toBe(1);

    // The next tag-out reaches the designated person, not the owner who unsubscribed.
    const second = await newChain();
    await tagOut(second.id, "Cracked hook");
    const subject = new RegExp(`^Tagged out: .*${second.tagCode}`);
    await latestMailTo(designated.email, { subject });
    expect(await recipientsOf("tag_out", subject)).toEqual([designated.email]);

    // The page's button, for another person and kind, with no session either.
    const key = (await testDb("signing_keys").where({ name: "unsubscribe" }).first("secret")).secret;
    const digestToken = unsubscribeToken(key, designated.userId, "digest");
    const action = discoveredActions().get("app/(auth)/actions.ts#unsubscribeAction")!;
    expect(await callAction(new Client(), { ...action, page: `/unsubscribe/${digestToken}` }, { token: digestToken })).toContain(
      `Linkyard stops sending the daily digest to ${designated.email}`,
    );
    expect((await testDb("mail_opt_outs").where({ user_id: designated.userId }).select("kind")).map((r) => r.kind)).toEqual(["digest"]);

    // Back on, from the preferences page, for the rest of these tests.
    await testDb("mail_opt_outs").whereIn("user_id", [org.userId, designated.userId]).delete();
  });
});

describe("e-mail preferences", () => {
  const save = () => discoveredActions().get("app/(app)/preferences/actions.ts#savePreferencesAction")!;
  const optOuts = async (userId: string) => (await testDb("mail_opt_outs").where({ user_id: userId }).orderBy("kind").select("kind")).map((r) => r.kind);

  it("offers each person the reminders of their role", async () => {
    const owner = await org.owner.get("/preferences");
    for (const title of ["Tag-outs", "Kits for today and tomorrow", "Daily digest"]) expect(owner.text).toContain(title);
    const plannerPage = await planner.client.get("/preferences");
    expect(plannerPage.text).toContain("Kits for today and tomorrow");
    expect(plannerPage.text).not.toContain("Daily digest");
    expect((await hand.client.get("/preferences")).text).toContain("nothing to choose here");
  });

  it("saves a person's choices, for the kinds the form showed and the role is offered", async () => {
    expect(await callAction(org.owner, save(), { shown: "tag_out,kit,digest", kit: "on" })).toContain("Your e-mail choices are saved.");
    expect(await optOuts(org.userId)).toEqual(["digest", "tag_out"]);
    expect(await countRows("audit_log", { organisation_id: org.organisationId, action: "mail.preferences_changed", actor_id: org.userId })).toBe(1);
    // A planner's form shows kits only; a tag-out choice sent anyway is not the planner's to make.
    await callAction(planner.client, save(), { shown: "kit,tag_out", tag_out: "on" });
    expect(await optOuts(planner.userId)).toEqual(["kit"]);
    expect(await callAction(org.owner, save(), { shown: "invite", invite: "on" })).toContain("an e-mail Linkyard does not send");
    // All back on.
    await callAction(org.owner, save(), { shown: "tag_out,kit,digest", tag_out: "on", kit: "on", digest: "on" });
    await callAction(planner.client, save(), { shown: "kit", kit: "on" });
    expect(await optOuts(org.userId)).toEqual([]);
    expect(await optOuts(planner.userId)).toEqual([]);
  });
});

describe("the daily digest", () => {
  it("goes out once at the organisation's time, with what is overdue, due this week or tagged out; planners hear of tomorrow's failing kits", async () => {
    const today = todayIn("UTC"); // the organisation's zone: sign-ups through the API without one are UTC
    const overdue = await newChain();
    const dueSoon = await newChain();
    const later = await newChain();
    const out = await newChain();
    const retired = await newChain();
    await testDb("items").where({ id: overdue.id }).update({ next_inspection_due: addDays(today, -3) });
    await testDb("items").where({ id: dueSoon.id }).update({ next_inspection_due: addDays(today, 2) });
    await testDb("items").where({ id: later.id }).update({ next_inspection_due: addDays(today, 10) });
    await testDb("items").where({ id: out.id }).update({ status: "tagged_out" });
    await testDb("items").where({ id: retired.id }).update({ status: "retired", next_inspection_due: addDays(today, -30) });
    const machine = await makeMachine(org.owner);
    const trailer = await makeTrailer(org.owner);
    const empty = await makeKit(org.owner, { date: addDays(today, 1), machineId: machine.id, trailerId: trailer.id, job: "Empty kit for tomorrow" });

    // The organisation was set up days ago and its digest time has passed today.
    await testDb("organisations").where({ id: org.organisationId }).update({ digest_time: "00:00", created_at: new Date(Date.now() - 2 * 86_400_000) });
    // Several schedulers tick at once: the day is queued once.
    await Promise.all([sendTestJob(QUEUES.dailyTick), sendTestJob(QUEUES.dailyTick), sendTestJob(QUEUES.dailyTick)]);

    const digestSubject = /\(Linkyard digest, /;
    const digest = await latestMailTo(org.email, { subject: digestSubject, timeoutMs: 20_000 });
    expect(digest.subject).toMatch(/^Reminder Co: 1 inspection overdue, 1 inspection due this week, \d+ items? tagged out \(Linkyard digest, \w{3} \d{4}-\d{2}-\d{2}\)$/);
    expect(digest.text).toContain(`- ${overdue.tagCode} Chain, grade 70, 3/8 in: was due ${addDays(today, -3)}, 3 days overdue`);
    expect(digest.text).toMatch(new RegExp(`- ${dueSoon.tagCode} Chain, grade 70, 3/8 in: due \\w{3} ${addDays(today, 2)}`));
    const taggedOut = digest.text.slice(digest.text.indexOf("Tagged out, waiting"));
    expect(taggedOut).toContain(`- ${out.tagCode} Chain`);
    expect(digest.text).not.toContain(later.tagCode);
    expect(digest.text).not.toContain(retired.tagCode);
    expect(digest.text).toContain("Stop the daily digest:");

    const kitSubject = /^Kit for Empty kit for tomorrow tomorrow does not pass its check$/;
    const kitMail = await latestMailTo(planner.email, { subject: kitSubject });
    expect(kitMail.text).toContain(`/kits/${empty.id}`);

    await latestMailTo(designated.email, { subject: digestSubject });
    expect(await recipientsOf("digest", digestSubject)).toEqual([org.email, designated.email].sort());
    expect(await recipientsOf("kit", kitSubject)).toEqual([org.email, planner.email].sort());
    expect(await countRows("daily_runs", { organisation_id: org.organisationId })).toBe(1);

    // Another tick the same day sends nothing more.
    await sendTestJob(QUEUES.dailyTick);
    await waitFor("the tick to run", async () => {
      const open = await testDb("pgboss.job").where({ name: QUEUES.dailyTick }).whereIn("state", ["created", "retry", "active"]).count("* as n").first();
      return open?.n === "0";
    });
    await sleep(1500);
    for (const email of [org.email, designated.email]) expect((await mailsTo(email)).filter((m) => digestSubject.test(m.subject))).toHaveLength(1);
    expect((await mailsTo(planner.email)).filter((m) => kitSubject.test(m.subject))).toHaveLength(1);
  }, 60_000);
});

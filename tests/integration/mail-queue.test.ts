import { randomUUID } from "node:crypto";
import { readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { callAction, discoveredActions } from "../support/actions";
import { countRows, testDb } from "../support/db";
import { latestMailTo, mailsTo, newOrganisation, uniqueEmail } from "../support/http";
import { QUEUES, sendTestJob, sleep, startMail, startWorker, stopMail, stopWorker, waitFor } from "../support/services";
import { sendJob } from "../../db/jobs";

// The durable e-mail queue: jobs written with the change, a worker that sends them, the
// mail fake stopped and started again, the worker restarted, two workers at once. The mail
// fake and the worker are always started again, whatever a test does.

const ROOT = path.resolve(__dirname, "../..");

afterAll(async () => {
  startMail();
  startWorker();
  await testDb.destroy();
});

const messagesTo = (email: string) => testDb("mail_messages").where({ to_address: email });
const jobsFor = (messageId: string) => testDb("pgboss.job").where({ name: QUEUES.mail }).whereRaw("data->>'messageId' = ?", [messageId]);

/** Invites an address; the answer comes without waiting for the mail server. */
async function invite(owner: Awaited<ReturnType<typeof newOrganisation>>["owner"], email: string) {
  const res = await owner.post("/api/v1/invites", { email, role: "planner" });
  expect(res.status).toBe(201);
}

describe("the e-mail queue", () => {
  it("writes a job only when its change commits", async () => {
    const rolledBack = randomUUID();
    await testDb
      .transaction(async (trx) => {
        await sendJob(trx, QUEUES.mail, { messageId: rolledBack });
        throw new Error("the change fails");
      })
      .catch(() => undefined);
    expect(await jobsFor(rolledBack).count("* as n").first()).toEqual({ n: "0" });

    const committed = randomUUID();
    await sendTestJob(QUEUES.mail, { messageId: committed });
    expect(await jobsFor(committed).count("* as n").first()).toEqual({ n: "1" });

    // Through the app: a tag-out refused (the item is out already) queues no e-mail.
    const org = await newOrganisation("Queue Rollback Co");
    const item = await org.owner.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "3/8" });
    expect((await org.owner.post(`/api/v1/items/${item.json.id}/events`, { type: "tag_out", note: "bent link" })).status).toBe(201);
    const queued = await countRows("mail_messages", { organisation_id: org.organisationId, kind: "tag_out" });
    expect(queued).toBe(1);
    expect((await org.owner.post(`/api/v1/items/${item.json.id}/events`, { type: "tag_out", note: "again" })).status).toBe(409);
    expect(await countRows("mail_messages", { organisation_id: org.organisationId, kind: "tag_out" })).toBe(queued);
  });

  it("answers while the mail server is down, and delivers once it is back, once", async () => {
    const { owner } = await newOrganisation("Outage Co");
    const email = uniqueEmail("outage");
    try {
      stopMail();
      await invite(owner, email);
      const first = await waitFor("a failed attempt", async () => {
        const row = await messagesTo(email).first("status", "attempts", "last_error");
        return row?.attempts >= 1 && row;
      });
      expect(first.status).toBe("queued");
      expect(first.last_error).toMatch(/ECONNREFUSED|connect/i);
    } finally {
      startMail();
    }
    const mail = await latestMailTo(email, { timeoutMs: 30_000 });
    expect(mail.subject).toBe("Owner Person invited you to Outage Co on Linkyard");
    await sleep(1500);
    expect(await mailsTo(email)).toHaveLength(1);
    const row = await messagesTo(email).first("status", "body", "sent_at");
    expect(row.status).toBe("sent");
    expect(row.body).toBeNull(); // the invite link is a secret: not kept once sent
  }, 60_000);

  it("marks a message that keeps failing as failed, shows it to the owner, and sends it again when asked", async () => {
    const org = await newOrganisation("Bounce Co");
    const email = uniqueEmail("bounce");
    try {
      stopMail();
      await invite(org.owner, email);
      // Three retries after the first attempt (1-2 s, 2-4 s, 4-8 s in npm test), then failed.
      await waitFor("the message to be marked failed", async () => (await messagesTo(email).first("status"))?.status === "failed", 45_000);
    } finally {
      startMail();
    }
    const row = await messagesTo(email).first("id", "attempts", "last_error");
    expect(row.attempts).toBe(4);
    const settings = await org.owner.get("/settings");
    expect(settings.text).toContain("E-mail that could not be sent");
    expect(settings.text).toContain(email);

    const resend = discoveredActions().get("app/(app)/settings/actions.ts#resendMailAction")!;
    expect(await callAction(org.owner, resend, { messageId: row.id })).toContain("Queued again");
    expect((await latestMailTo(email, { timeoutMs: 20_000 })).subject).toBe("Owner Person invited you to Bounce Co on Linkyard");
    // The mail fake has it once the SMTP reply came; the worker marks it sent just after.
    await expect.poll(async () => (await messagesTo(email).first("status")).status, { timeout: 10_000 }).toBe("sent");
    expect((await org.owner.get("/settings")).text).not.toContain(email);
    expect(await countRows("audit_log", { organisation_id: org.organisationId, action: "mail.resent", entity_id: row.id })).toBe(1);
  }, 90_000);

  it("sends each message once across a restart of the worker", async () => {
    const { owner } = await newOrganisation("Restart Mail Co");
    const emails = Array.from({ length: 5 }, () => uniqueEmail("restart"));
    try {
      stopMail();
      for (const email of emails) await invite(owner, email);
      await waitFor("a failed attempt at each", async () => {
        const rows = await testDb("mail_messages").whereIn("to_address", emails).where("attempts", ">=", 1);
        return rows.length === emails.length;
      });
      stopWorker(); // stops cleanly, with the messages waiting for their next retry
      startMail();
      startWorker();
    } finally {
      startMail();
      startWorker();
    }
    for (const email of emails) await latestMailTo(email, { timeoutMs: 30_000 });
    await sleep(2000);
    for (const email of emails) expect(await mailsTo(email)).toHaveLength(1);
    expect(await testDb("mail_messages").whereIn("to_address", emails).where({ status: "sent" }).count("* as n").first()).toEqual({ n: String(emails.length) });
  }, 90_000);

  it("sends each message once when its job runs three times on two workers at once", async () => {
    const org = await newOrganisation("Twin Workers Co");
    const emails = Array.from({ length: 8 }, () => uniqueEmail("twin"));
    try {
      startWorker("test-worker-2");
      const ids = await testDb.transaction(async (trx) => {
        const rows = await trx("mail_messages")
          .insert(emails.map((to, i) => ({ organisation_id: org.organisationId, kind: "invite", idempotency_key: `twin-${to}`, to_address: to, subject: `Twin ${i}`, body: "Once only." })))
          .returning("id");
        for (const { id } of rows) for (let n = 0; n < 3; n++) await sendJob(trx, QUEUES.mail, { messageId: id });
        return rows.map((r: { id: string }) => r.id);
      });
      for (const email of emails) await latestMailTo(email, { timeoutMs: 20_000 });
      // Every job has run: the two copies of each that found the message sent, or busy and retried.
      await waitFor("every job done", async () => {
        const open = await testDb("pgboss.job").where({ name: QUEUES.mail }).whereRaw("data->>'messageId' = any(?)", [ids]).whereNot({ state: "completed" }).count("* as n").first();
        return open?.n === "0";
      });
      for (const email of emails) expect(await mailsTo(email)).toHaveLength(1);
      const logs = ["test-worker", "test-worker-2"].map((n) => readFileSync(path.join(ROOT, `.data/${n}.log`), "utf8")).join("\n");
      for (const id of ids) {
        expect(logs.match(new RegExp(`mail ${id}: sent$`, "gm"))).toHaveLength(1);
        expect(logs.match(new RegExp(`mail ${id}: already sent$`, "gm"))).toHaveLength(2);
      }
    } finally {
      stopWorker("test-worker-2");
    }
  }, 90_000);
});

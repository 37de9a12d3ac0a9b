import "server-only";
import { inTransaction } from "@/db";
import { listReminderRecipients } from "@/db/mail";
import { claimDay, listDigestItems, listOrganisationsForDaily, openKitIdsOn, type DailyOrganisation, type DigestRow } from "@/db/reminders";
import { config } from "@/lib/config";
import { loadKit } from "@/lib/kits/kit-service";
import { kitVerdict } from "@/lib/kits/plan";
import { receivesByRole } from "@/lib/mail/kinds";
import { queueMail, reminderMessage } from "@/lib/mail/queue";
import { kitCheckMail } from "@/lib/mail/templates";
import { DUE_THIS_WEEK_DAYS } from "@/lib/stock/api-schemas";
import { inspectionOverdue } from "@/lib/stock/usability";
import { describeItem } from "@/lib/stock/describe";
import { addDays } from "@/lib/time";
import { buildDigest, type DigestItem } from "./digest";
import { dailyRunDue } from "./schedule";

// Each organisation's day of reminders, at its digest time on its own clock: the digest to
// the owners and designated people, and to the planners a word on each kit of tomorrow that
// does not pass its check. The worker calls runDueDays every minute; the day is claimed in
// the same transaction that queues its e-mails (daily_runs), so however many workers call
// at once, one of them queues the day and the others nothing.

/** Runs the day of every organisation whose digest time has come; answers the days run. */
export async function runDueDays(now: Date = new Date()): Promise<{ organisationId: string; day: string }[]> {
  const ran: { organisationId: string; day: string }[] = [];
  for (const org of await listOrganisationsForDaily()) {
    const day = dailyRunDue(org, now);
    if (day && (await runDay(org, day))) ran.push({ organisationId: org.id, day });
  }
  return ran;
}

const toDigestItem = (r: DigestRow): DigestItem => ({ tagCode: r.tagCode, description: describeItem(r), yardName: r.yardName, nextInspectionDue: r.nextInspectionDue });

/** Kits of a date that do not pass, with the reasons in words. */
async function failingKits(organisationId: string, date: string) {
  const failing = [];
  for (const id of await openKitIdsOn(organisationId, date)) {
    const kit = await loadKit(organisationId, id);
    if (!kit) continue;
    const verdict = kitVerdict(kit);
    if (verdict.pass) continue;
    const reasons = [...verdict.blockers.map((b) => b.message), ...verdict.check.findings.filter((f) => f.severity === "fail").map((f) => f.message)];
    failing.push({ kit, reasons: reasons.length ? reasons : ["The check does not pass."] });
  }
  return failing;
}

/** Queues one organisation's day; false when another worker had it already. */
export async function runDay(org: Pick<DailyOrganisation, "id" | "name">, day: string): Promise<boolean> {
  const rows = await listDigestItems(org.id, addDays(day, DUE_THIS_WEEK_DAYS));
  const inService = rows.filter((r) => r.status === "in_service" && r.nextInspectionDue);
  const digest = buildDigest({
    organisationName: org.name,
    today: day,
    overdue: inService.filter((r) => inspectionOverdue(r.nextInspectionDue, day)).map(toDigestItem),
    dueThisWeek: inService.filter((r) => !inspectionOverdue(r.nextInspectionDue, day)).map(toDigestItem),
    taggedOut: rows.filter((r) => r.status === "tagged_out").map(toDigestItem),
    appUrl: config.APP_URL,
  });
  const tomorrow = addDays(day, 1);
  const kits = await failingKits(org.id, tomorrow);

  return inTransaction(async (trx) => {
    if (!(await claimDay(org.id, day, trx))) return false;
    if (digest) {
      for (const person of (await listReminderRecipients(org.id, "digest", trx)).filter((p) => receivesByRole(p, "digest"))) {
        await queueMail(trx, {
          kind: "digest",
          idempotencyKey: `digest:${org.id}:${day}:${person.id}`,
          organisationId: org.id,
          userId: person.id,
          message: await reminderMessage("digest", person, org.name, { to: person.email, ...digest }),
        });
      }
    }
    if (kits.length) {
      const planners = (await listReminderRecipients(org.id, "kit", trx)).filter((p) => receivesByRole(p, "kit"));
      for (const { kit, reasons } of kits) {
        for (const person of planners) {
          const message = kitCheckMail({ to: person.email, job: kit.job, kitDate: tomorrow, machine: kit.machine.name, trailer: kit.trailer.name, reasons, link: `${config.APP_URL}/kits/${kit.id}` });
          await queueMail(trx, {
            kind: "kit",
            idempotencyKey: `kit_check:${kit.id}:${day}:${person.id}`,
            organisationId: org.id,
            userId: person.id,
            message: await reminderMessage("kit", person, org.name, message),
          });
        }
      }
    }
    return true;
  });
}

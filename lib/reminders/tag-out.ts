import "server-only";
import type { Tx } from "@/db";
import { listReminderRecipients, type MailRecipient } from "@/db/mail";
import { getOrganisation } from "@/db/organisations";
import { openKitsHolding } from "@/db/reminders";
import { config } from "@/lib/config";
import { receivesByRole, type ReminderKind } from "@/lib/mail/kinds";
import { queueMail, reminderMessage } from "@/lib/mail/queue";
import { damageReportMail, kitLostItemMail } from "@/lib/mail/templates";
import { describeItem } from "@/lib/stock/describe";
import { addDays, todayIn } from "@/lib/time";

// What a tag-out tells people, queued in the tag-out's own transaction: the owners and
// designated people at once, and the planners of a kit for today or tomorrow that held the
// item. Each e-mail's key names the tag-out's history entry, so it is queued once.

export interface TaggedOutItem {
  id: string;
  tagCode: string;
  kind: string;
  grade: number | null;
  size: string | null;
  details?: Record<string, unknown> | null;
}

async function recipients(trx: Tx, organisationId: string, kind: ReminderKind): Promise<MailRecipient[]> {
  return (await listReminderRecipients(organisationId, kind, trx)).filter((p) => receivesByRole(p, kind));
}

/**
 * Queues the e-mails of a tag-out.
 * @example await queueTagOutMail(trx, { organisationId, eventId, reporterName: actor.name, item, defects: [], note })
 */
export async function queueTagOutMail(
  trx: Tx,
  t: { organisationId: string; eventId: string | number; reporterName: string; item: TaggedOutItem; defects: string[]; note: string | null },
): Promise<void> {
  const organisation = (await getOrganisation(t.organisationId, trx))!;
  const itemDescription = describeItem(t.item);
  for (const person of await recipients(trx, t.organisationId, "tag_out")) {
    const message = damageReportMail({
      to: person.email,
      reporterName: t.reporterName,
      itemDescription,
      tagCode: t.item.tagCode,
      defects: t.defects,
      note: t.note,
      link: `${config.APP_URL}/items/${t.item.id}`,
    });
    await queueMail(trx, {
      kind: "tag_out",
      idempotencyKey: `tag_out:${t.eventId}:${person.id}`,
      organisationId: t.organisationId,
      userId: person.id,
      message: await reminderMessage("tag_out", person, organisation.name, message),
    });
  }

  const today = todayIn(organisation.timeZone);
  const kits = await openKitsHolding(t.organisationId, t.item.id, [today, addDays(today, 1)], trx);
  if (!kits.length) return;
  const planners = await recipients(trx, t.organisationId, "kit");
  for (const kit of kits) {
    for (const person of planners) {
      const message = kitLostItemMail({
        to: person.email,
        job: kit.job,
        kitDate: kit.date,
        today,
        itemDescription,
        tagCode: t.item.tagCode,
        reporterName: t.reporterName,
        note: t.note,
        link: `${config.APP_URL}/kits/${kit.kitId}`,
      });
      await queueMail(trx, {
        kind: "kit",
        idempotencyKey: `kit_lost:${t.eventId}:${kit.kitId}:${person.id}`,
        organisationId: t.organisationId,
        userId: person.id,
        message: await reminderMessage("kit", person, organisation.name, message),
      });
    }
  }
}

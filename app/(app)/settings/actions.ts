"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { formAction } from "@/lib/auth/action";
import { createApiToken, revokeToken } from "@/lib/auth/api-tokens";
import { flagField, nameField, roleField, timeZoneField } from "@/lib/auth/schemas";
import { UNIT_SYSTEM_LABELS } from "@/lib/kits/display";
import { setUnitsPreference } from "@/lib/kits/fleet-service";
import { unitsSchema } from "@/lib/kits/schemas";
import { resendFailedMail, saveDigestTime } from "@/lib/mail/service";
import { saveInspectionIntervals, saveOrganisation } from "@/lib/organisations/service";
import { ITEM_KINDS, KIND_LABELS, type ItemKind } from "@/lib/stock/labels";

export const saveOrganisationAction = formAction(
  "settings.manage",
  z.object({ name: nameField, publicTagView: flagField, timeZone: timeZoneField }),
  async (input, principal) => {
    await saveOrganisation(principal, input);
    revalidatePath("/", "layout");
    return { ok: true, message: "Settings saved." };
  },
);

export const createTokenAction = formAction(
  "settings.manage",
  z.object({ name: nameField, role: roleField }),
  async (input, principal) => {
    const secret = await createApiToken(principal, input);
    revalidatePath("/settings");
    return { ok: true, message: "Token created. Copy it now: it is shown only once.", values: { secret } };
  },
);

export const revokeTokenAction = formAction(
  "settings.manage",
  z.object({ tokenId: z.uuid("That token id is not valid.") }),
  async ({ tokenId }, principal) => {
    await revokeToken(principal, tokenId);
    revalidatePath("/settings");
    return { ok: true, message: "Token revoked." };
  },
);

const intervalsForm = z.object(
  Object.fromEntries(
    ITEM_KINDS.map((k) => [
      k,
      z.coerce
        .number({ error: `Days for ${KIND_LABELS[k].toLowerCase()} must be a number.` })
        .int(`Days for ${KIND_LABELS[k].toLowerCase()} must be whole days.`)
        .min(1, "At least 1 day.")
        .max(3650, "At most 3,650 days (10 years)."),
    ]),
  ),
);

/** Days between periodic inspections, per kind; applies to inspections recorded from now on. */
export const saveIntervalsAction = formAction("settings.manage", intervalsForm, async (input, principal) => {
  await saveInspectionIntervals(principal, input as Record<ItemKind, number>);
  revalidatePath("/settings");
  return { ok: true, message: "Inspection intervals saved. They apply from the next inspection of each item." };
});

/** Which system figures are shown in first (the other is always shown beside it). */
export const saveUnitsAction = formAction("settings.manage", unitsSchema, async ({ units }, principal) => {
  await setUnitsPreference(principal, units);
  revalidatePath("/", "layout");
  return { ok: true, message: `Figures are now shown in ${UNIT_SYSTEM_LABELS[units]} first.` };
});

/** HH:mm, 24-hour (a browser's time box may add seconds, which are dropped). */
const digestTimeField = z
  .string({ error: "Enter a time, like 06:00." })
  .trim()
  .regex(/^([01]\d|2[0-3]):[0-5]\d(:[0-5]\d)?$/, "Enter a time between 00:00 and 23:59, like 06:00.")
  .transform((v) => v.slice(0, 5));

/** When the daily digest goes out, on the organisation's clock. */
export const saveDigestTimeAction = formAction("settings.manage", z.object({ digestTime: digestTimeField }), async ({ digestTime }, principal) => {
  await saveDigestTime(principal, digestTime);
  revalidatePath("/settings");
  return { ok: true, message: `The daily digest goes out at ${digestTime} from tomorrow, or today if that time is still to come and today's has not gone.` };
});

/** A failed e-mail back to the queue. */
export const resendMailAction = formAction("settings.manage", z.object({ messageId: z.uuid("That e-mail id is not valid.") }), async ({ messageId }, principal) => {
  await resendFailedMail(principal, messageId);
  revalidatePath("/settings");
  return { ok: true, message: "Queued again: it goes out as soon as the mail server takes it." };
});

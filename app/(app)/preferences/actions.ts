"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { formAction } from "@/lib/auth/action";
import { flagField } from "@/lib/auth/schemas";
import { isReminderKind, REMINDER_KINDS, type ReminderKind } from "@/lib/mail/kinds";
import { saveMailPreferences } from "@/lib/mail/service";

/** The kinds the form showed, comma-separated: only those change. */
const shownField = z
  .string({ error: "The form lost its list of e-mails. Reload the page and try again." })
  .min(1, "The form lost its list of e-mails. Reload the page and try again.")
  .transform((v, ctx) => {
    const kinds = v.split(",");
    if (!kinds.every(isReminderKind)) {
      ctx.addIssue({ code: "custom", message: "The form lists an e-mail Linkyard does not send. Reload the page and try again." });
      return z.NEVER;
    }
    return kinds as ReminderKind[];
  });

const choices = z.object({ shown: shownField, ...Object.fromEntries(REMINDER_KINDS.map((k) => [k, flagField])) } as { shown: typeof shownField } & Record<ReminderKind, typeof flagField>);

/** A person's own reminder e-mails: each box ticked is on, each left empty off. */
export const savePreferencesAction = formAction("mail.preferences", choices, async (input, principal) => {
  await saveMailPreferences(principal, input.shown, REMINDER_KINDS.filter((k) => input[k]));
  revalidatePath("/preferences");
  return { ok: true, message: "Your e-mail choices are saved." };
});

import type { Metadata } from "next";
import { MailPreferencesForm } from "@/components/mail/preferences-form";
import { requirePage } from "@/lib/auth/session";
import { mailPreferences } from "@/lib/mail/service";
import { savePreferencesAction } from "./actions";

export const metadata: Metadata = { title: "E-mail" };

/** Each person chooses the reminders Linkyard e-mails them. */
export default async function PreferencesPage() {
  const principal = await requirePage("mail.preferences");
  const { kinds, on } = await mailPreferences(principal);
  return (
    <div className="flex max-w-2xl flex-col gap-6">
      <h1 className="text-3xl font-bold">E-mail</h1>
      <p className="text-lg">
        Linkyard e-mails you at <strong>{principal.email}</strong>. E-mails about your account (invites, password resets) always come.
      </p>
      {kinds.length ? (
        <MailPreferencesForm kinds={kinds} on={on} action={savePreferencesAction} />
      ) : (
        <p className="rounded-lg border-2 border-ink-soft p-3 text-lg">
          Reminders go to owners, planners and designated people: none are sent to your role, so there is nothing to choose here.
        </p>
      )}
    </div>
  );
}

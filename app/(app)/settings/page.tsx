import type { Metadata } from "next";
import { CreateTokenForm, IntervalsForm, OrganisationForm, RevokeTokenButton } from "@/components/settings/settings-forms";
import { DigestTimeForm, ResendMailButton } from "@/components/settings/mail-settings";
import { UnitsForm } from "@/components/settings/units-form";
import { getUnits } from "@/db/fleet";
import { listApiTokens } from "@/db/api-tokens";
import { getOrganisation } from "@/db/organisations";
import { failedMail } from "@/lib/mail/service";
import { inspectionIntervals } from "@/lib/organisations/service";
import { ROLE_LABELS, type Role } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";
import { formatDateTime, formatDay, timeZones } from "@/lib/time";
import { createTokenAction, resendMailAction, revokeTokenAction, saveDigestTimeAction, saveIntervalsAction, saveOrganisationAction, saveUnitsAction } from "./actions";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage() {
  const principal = await requirePage("settings.manage");
  const [organisation, tokens, intervals, units, failed] = await Promise.all([
    getOrganisation(principal.organisationId),
    listApiTokens(principal.organisationId),
    inspectionIntervals(principal.organisationId),
    getUnits(principal.organisationId),
    failedMail(principal),
  ]);
  return (
    <div className="flex max-w-3xl flex-col gap-6">
      <h1 className="text-3xl font-bold">Settings</h1>
      <OrganisationForm name={organisation!.name} publicTagView={organisation!.publicTagView} timeZone={organisation!.timeZone} timeZones={timeZones()} action={saveOrganisationAction} />
      <UnitsForm units={units} action={saveUnitsAction} />
      <IntervalsForm intervals={intervals} action={saveIntervalsAction} />
      <section aria-labelledby="mail-heading" className="flex flex-col gap-3 rounded-xl border-2 border-ink-soft p-4">
        <h2 id="mail-heading" className="text-xl font-bold">E-mail</h2>
        <DigestTimeForm digestTime={organisation!.digestTime} timeZone={organisation!.timeZone} action={saveDigestTimeAction} />
        <h3 className="text-lg font-bold">E-mail that could not be sent</h3>
        {failed.length ? (
          <>
            <p className="text-base">
              The mail server refused these or could not be reached, and Linkyard stopped trying after several hours. Check the address, then send again.
            </p>
            <ul className="flex flex-col gap-2" aria-label="E-mail that could not be sent">
              {failed.map((m) => (
                <li key={m.id} className="flex flex-col gap-2 rounded-lg border-2 border-stop p-3">
                  <span className="text-lg">
                    <span aria-hidden="true">✕ </span>
                    <strong>Not sent</strong> to {m.to}: {m.subject}
                  </span>
                  <span className="text-sm text-ink-soft">
                    Written {formatDateTime(m.createdAt, organisation!.timeZone)}, gave up {formatDateTime(m.failedAt, organisation!.timeZone)} after {m.attempts} attempts
                    {m.lastError ? `. Last answer: ${m.lastError}` : ""}
                  </span>
                  <ResendMailButton messageId={m.id} to={m.to} action={resendMailAction} />
                </li>
              ))}
            </ul>
          </>
        ) : (
          <p className="text-base">None: every e-mail went out or is waiting its turn.</p>
        )}
      </section>
      <section aria-labelledby="tokens-heading" className="flex flex-col gap-3 rounded-xl border-2 border-ink-soft p-4">
        <h2 id="tokens-heading" className="text-xl font-bold">API tokens</h2>
        <p className="text-base">
          For integrations: send <code className="font-mono">Authorization: Bearer &lt;token&gt;</code> to{" "}
          <code className="font-mono">/api/v1/…</code>. A token acts with the role you choose, never above your own role: if your role is lowered, your tokens are lowered with it, and if you are disabled or reset your password, they stop working.
        </p>
        <ul className="flex flex-col gap-2">
          {tokens.map((t) => (
            <li key={t.id} className="flex flex-wrap items-center justify-between gap-2 rounded-lg border-2 border-idle p-3">
              <span className="text-lg">
                <strong>{t.name}</strong> · {ROLE_LABELS[t.role as Role]} ·{" "}
                {t.lastUsedAt ? `last used ${formatDay(t.lastUsedAt, organisation!.timeZone)}` : "never used"}
              </span>
              <RevokeTokenButton tokenId={t.id} name={t.name} action={revokeTokenAction} />
            </li>
          ))}
        </ul>
        <CreateTokenForm action={createTokenAction} />
      </section>
    </div>
  );
}

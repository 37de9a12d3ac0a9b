import type { Metadata } from "next";
import { CreateTokenForm, IntervalsForm, OrganisationForm, RevokeTokenButton } from "@/components/settings/settings-forms";
import { UnitsForm } from "@/components/settings/units-form";
import { getFleetSettings } from "@/db/fleet";
import { listApiTokens } from "@/db/api-tokens";
import { getOrganisation, getOrganisationSettings } from "@/db/people";
import { intervalsWithDefaults } from "@/lib/stock/intervals";
import { ROLE_LABELS, type Role } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage() {
  const principal = await requirePage("settings.manage");
  const [organisation, tokens, settings, fleet] = await Promise.all([
    getOrganisation(principal.organisationId),
    listApiTokens(principal.organisationId),
    getOrganisationSettings(principal.organisationId),
    getFleetSettings(principal.organisationId),
  ]);
  return (
    <div className="flex max-w-3xl flex-col gap-6">
      <h1 className="text-3xl font-bold">Settings</h1>
      <OrganisationForm name={organisation!.name} publicTagView={organisation!.publicTagView} />
      <UnitsForm units={fleet.units} />
      <IntervalsForm intervals={intervalsWithDefaults(settings?.inspectionIntervalDays)} />
      <section aria-labelledby="tokens-heading" className="flex flex-col gap-3 rounded-xl border-2 border-ink-soft p-4">
        <h2 id="tokens-heading" className="text-xl font-bold">API tokens</h2>
        <p className="text-base">
          For integrations: send <code className="font-mono">Authorization: Bearer &lt;token&gt;</code> to{" "}
          <code className="font-mono">/api/v1/…</code>. A token acts with the role you choose.
        </p>
        <ul className="flex flex-col gap-2">
          {tokens.map((t) => (
            <li key={t.id} className="flex flex-wrap items-center justify-between gap-2 rounded-lg border-2 border-idle p-3">
              <span className="text-lg">
                <strong>{t.name}</strong> · {ROLE_LABELS[t.role as Role]} ·{" "}
                {t.lastUsedAt ? `last used ${new Date(t.lastUsedAt).toLocaleDateString("en-CA")}` : "never used"}
              </span>
              <RevokeTokenButton tokenId={t.id} name={t.name} />
            </li>
          ))}
        </ul>
        <CreateTokenForm />
      </section>
    </div>
  );
}

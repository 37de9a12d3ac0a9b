import type { Metadata } from "next";
import { InviteForm, PersonRow, WithdrawInviteButton } from "@/components/people/people-forms";
import { inviteAction, updatePersonAction, withdrawInviteAction } from "./actions";
import { listOpenInvites, listPeople } from "@/db/people";
import { ROLE_LABELS, type Role } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";
import { principalClock } from "@/lib/organisations/service";
import { formatDay } from "@/lib/time";

export const metadata: Metadata = { title: "People" };

export default async function PeoplePage() {
  const principal = await requirePage("people.manage");
  const [people, invites, { timeZone }] = await Promise.all([
    listPeople(principal.organisationId),
    listOpenInvites(principal.organisationId),
    principalClock(principal),
  ]);
  return (
    <div className="flex max-w-3xl flex-col gap-6">
      <h1 className="text-3xl font-bold">People</h1>
      <InviteForm action={inviteAction} />
      {invites.length > 0 && (
        <section aria-labelledby="invites-heading" className="flex flex-col gap-2">
          <h2 id="invites-heading" className="text-xl font-bold">Waiting for an answer</h2>
          <ul className="flex flex-col gap-2">
            {invites.map((i) => (
              <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 rounded-xl border-2 border-ink-soft p-3">
                <span className="text-lg">
                  <strong>{i.email}</strong> as {ROLE_LABELS[i.role as Role].toLowerCase()}, until{" "}
                  {formatDay(i.expiresAt, timeZone)}
                </span>
                <WithdrawInviteButton inviteId={i.id} email={i.email} action={withdrawInviteAction} />
              </li>
            ))}
          </ul>
        </section>
      )}
      <section aria-labelledby="team-heading" className="flex flex-col gap-2">
        <h2 id="team-heading" className="text-xl font-bold">Team</h2>
        <ul className="grid gap-3 md:grid-cols-2">
          {people.map((p) => (
            <PersonRow key={p.id} person={p} isSelf={p.id === principal.userId} action={updatePersonAction} />
          ))}
        </ul>
      </section>
    </div>
  );
}

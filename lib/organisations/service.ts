import "server-only";
import { audited } from "@/db/audit";
import { getInspectionIntervals, getOrganisation, getTimeZone, setInspectionIntervals, updateOrganisation } from "@/db/organisations";
import { can } from "@/lib/auth/roles";
import type { Principal } from "@/lib/auth/session";
import { forbidden } from "@/lib/http/errors";
import type { ItemKind } from "@/lib/stock/labels";
import { intervalsWithDefaults } from "@/lib/stock/intervals";
import { DEFAULT_TIME_ZONE, todayIn } from "@/lib/time";

// The organisation's own settings, changed by an owner on the Settings page.

function mustManage(actor: Principal) {
  if (!can(actor, "settings.manage")) throw forbidden();
}

/** The company name, its time zone, and whether a stranger who scans a tag sees its public summary. */
export async function saveOrganisation(actor: Principal, input: { name: string; publicTagView: boolean; timeZone: string }): Promise<void> {
  mustManage(actor);
  await audited(actor, async (tx, audit) => {
    const before = await getOrganisation(actor.organisationId, tx);
    await updateOrganisation(actor.organisationId, input, tx);
    await audit({ action: "organisation.updated", entity: "organisation", entityId: actor.organisationId, before, after: input });
  });
}

/** Days between periodic inspections, per kind; they apply to inspections recorded from now on. */
export async function saveInspectionIntervals(actor: Principal, intervals: Record<ItemKind, number>): Promise<void> {
  mustManage(actor);
  await audited(actor, async (tx, audit) => {
    const before = await getInspectionIntervals(actor.organisationId, tx);
    await setInspectionIntervals(actor.organisationId, intervals, tx);
    await audit({ action: "organisation.intervals_updated", entity: "organisation", entityId: actor.organisationId, before, after: intervals });
  });
}

/** The organisation's inspection intervals, with the defaults for kinds it never set. */
export async function inspectionIntervals(organisationId: string): Promise<Record<ItemKind, number>> {
  return intervalsWithDefaults(await getInspectionIntervals(organisationId));
}

/**
 * The organisation's clock: its time zone and today's date there (YYYY-MM-DD). "Today",
 * "overdue" and the dates shown to its people all come from here.
 */
export async function organisationClock(organisationId: string, now: Date = new Date()): Promise<{ timeZone: string; today: string }> {
  const timeZone = (await getTimeZone(organisationId)) ?? DEFAULT_TIME_ZONE;
  return { timeZone, today: todayIn(timeZone, now) };
}

/**
 * The same clock for the signed-in person's organisation, from the time zone read with the
 * session or token (lib/auth/session.ts): no query of its own. Pages and routes use this;
 * work without a principal (the worker, imports in a job) uses {@link organisationClock}.
 */
export function principalClock(principal: Pick<Principal, "timeZone">, now: Date = new Date()): { timeZone: string; today: string } {
  return { timeZone: principal.timeZone, today: todayIn(principal.timeZone, now) };
}

import "server-only";
import { audited } from "@/db/audit";
import { getInspectionIntervals, getOrganisation, setInspectionIntervals, updateOrganisation } from "@/db/organisations";
import { can } from "@/lib/auth/roles";
import type { Principal } from "@/lib/auth/session";
import { forbidden } from "@/lib/http/errors";
import type { ItemKind } from "@/lib/stock/labels";
import { intervalsWithDefaults } from "@/lib/stock/intervals";

// The organisation's own settings, changed by an owner on the Settings page.

function mustManage(actor: Principal) {
  if (!can(actor, "settings.manage")) throw forbidden();
}

/** The company name and whether a stranger who scans a tag sees its public summary. */
export async function saveOrganisation(actor: Principal, input: { name: string; publicTagView: boolean }): Promise<void> {
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

import "server-only";
import { notFound } from "next/navigation";
import { getUnits } from "@/db/fleet";
import type { Permission } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";
import { isUuid } from "@/lib/http/ids";
import { principalClock } from "@/lib/organisations/service";
import { kitJson } from "./answers";
import { loadKit } from "./kit-service";

/**
 * For the kit pages: the signed-in person (sign-in or 403 otherwise), the kit of their
 * organisation named by the path as the API answers it (404 for a malformed id or another
 * organisation's), the organisation's units and today's date in its time zone.
 */
export async function requireKitPage(permission: Permission, params: Promise<{ id: string }>) {
  const principal = await requirePage(permission);
  const { id } = await params;
  if (!isUuid(id)) notFound();
  const kit = await loadKit(principal.organisationId, id);
  if (!kit) notFound();
  const [units, { timeZone, today }] = await Promise.all([getUnits(principal.organisationId), principalClock(principal)]);
  return { principal, kit: kitJson(kit), units, timeZone, today };
}

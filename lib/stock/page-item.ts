import "server-only";
import { notFound } from "next/navigation";
import { getItem } from "@/db/items";
import type { Permission } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";
import { isUuid } from "@/lib/http/ids";
import { principalClock } from "@/lib/organisations/service";

/**
 * For the item pages: the signed-in person (sign-in or 403 otherwise) and the item of their
 * organisation named by the path, or a 404 for a malformed id or another organisation's;
 * with the organisation's clock (its time zone and today), for the dates the page shows.
 */
export async function requireItemPage(permission: Permission, params: Promise<{ id: string }>) {
  const principal = await requirePage(permission);
  const { id } = await params;
  if (!isUuid(id)) notFound();
  const item = await getItem(principal.organisationId, id);
  if (!item) notFound();
  return { principal, id, item, clock: await principalClock(principal) };
}

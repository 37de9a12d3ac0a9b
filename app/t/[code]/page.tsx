import type { Metadata } from "next";
import { headers } from "next/headers";
import { notFound, redirect } from "next/navigation";
import { PublicTagView } from "@/components/tags/public-tag-view";
import { findItemByTag } from "@/db/items";
import { getOrganisation } from "@/db/organisations";
import { getPrincipal } from "@/lib/auth/session";
import { tagCodeFromPath } from "@/lib/tags/entry";
import { clientIp } from "@/lib/http/client-ip";
import { recordLookup } from "@/lib/tags/lookups";
import { itemVerdict } from "@/lib/stock/verdict";
import { todayIn } from "@/lib/time";

export const metadata: Metadata = { title: "Tag", robots: { index: false, follow: false } };

/**
 * What a QR tag opens. A member of the item's organisation goes to the item; anyone else
 * gets the public summary when the organisation allows it. Otherwise a stranger is sent to
 * sign in, for a real code and an unknown one alike, so the answer never tells whether a
 * code exists; a signed-in person of another organisation gets the same 404 as for an
 * unknown code. Text that is not a tag code at all is a 404 (no code can exist there).
 * proxy.ts answers 429 to an address that misses too often.
 */
export default async function TagPage({ params }: { params: Promise<{ code: string }> }) {
  const { code: raw } = await params;
  const ip = clientIp(await headers());
  const code = tagCodeFromPath(raw);
  if (!code) {
    await recordLookup(ip, false);
    notFound();
  }
  const [item, principal] = await Promise.all([findItemByTag(code), getPrincipal()]);

  if (item && principal?.organisationId === item.organisationId) {
    await recordLookup(ip, true);
    redirect(`/items/${item.id}`);
  }
  const organisation = item ? await getOrganisation(item.organisationId) : undefined;
  if (item && organisation?.publicTagView) {
    await recordLookup(ip, true);
    const { timeZone } = organisation;
    return <PublicTagView item={item} usable={itemVerdict(item, { timeZone, today: todayIn(timeZone) })} />;
  }

  // Unknown, or another organisation's private tag: one answer for both. A real code is
  // not a miss (a yard hand who scans before signing in never meets the limit).
  await recordLookup(ip, Boolean(item));
  if (principal) notFound(); // signing in again would not help
  redirect(`/sign-in?next=${encodeURIComponent(`/t/${code}`)}`);
}

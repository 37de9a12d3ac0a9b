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

export const metadata: Metadata = { title: "Tag", robots: { index: false, follow: false } };

/**
 * What a QR tag opens. A member of the item's organisation goes to the item; anyone else
 * gets the public summary when the organisation allows it, else the sign-in page. Unknown
 * codes are a 404; proxy.ts answers 429 to an address that misses too often.
 */
export default async function TagPage({ params }: { params: Promise<{ code: string }> }) {
  const { code: raw } = await params;
  const ip = clientIp(await headers());
  const code = tagCodeFromPath(raw);
  const item = code ? await findItemByTag(code) : undefined;
  if (!item) {
    await recordLookup(ip, false);
    notFound();
  }

  const principal = await getPrincipal();
  if (principal?.organisationId === item.organisationId) {
    await recordLookup(ip, true);
    redirect(`/items/${item.id}`);
  }

  const organisation = await getOrganisation(item.organisationId);
  if (!organisation?.publicTagView) {
    if (principal) {
      // Signed in to another organisation: signing in again would not help, and the
      // answer must not tell them the code exists.
      await recordLookup(ip, false);
      notFound();
    }
    await recordLookup(ip, true);
    redirect(`/sign-in?next=${encodeURIComponent(`/t/${item.tagCode}`)}`);
  }

  await recordLookup(ip, true);
  return <PublicTagView item={item} />;
}

"use client";
import { KitDeck } from "@/components/kits/deck/kit-deck";
import { kitFromJson } from "@/lib/kits/answers";
import { deckPicture } from "@/lib/kits/deck";
import { useKit } from "./use-kit";

/**
 * The live kit on its trailer (lib/kits/deck.ts, drawn by components/kits/deck): redrawn from
 * the kit in the page's cache after every change; each tiedown in it links to its card.
 */
export function KitDeckSection({ kitId }: { kitId: string }) {
  const { data } = useKit(kitId);
  if (!data) return null;
  // The answer carries the check and blockers the picture reads, so nothing is computed twice.
  return <KitDeck picture={deckPicture(kitFromJson(data), data)} idPrefix={`deck-${kitId}`} />;
}

import "server-only";
import type { Tx } from "@/db";
import { existingTagCodes } from "@/db/items";
import { newTagCode } from "@/lib/tags/code";

/**
 * Tag codes no item has yet, for the add-item form (one) and an import (a chunk at a time):
 * drawn at random and checked in one query per round. A clash is rare (23^8 codes) but checked.
 * `alsoTaken` holds codes the query cannot see yet (an import's earlier chunks, not committed).
 */
export async function freshTagCodes(count: number, tx?: Tx, alsoTaken?: ReadonlySet<string>): Promise<string[]> {
  const codes = new Set<string>();
  for (let round = 0; codes.size < count; round++) {
    if (round > 5) throw new Error("could not draw free tag codes");
    const drawn = new Set<string>();
    while (drawn.size < count - codes.size) {
      const c = newTagCode();
      if (!codes.has(c) && !alsoTaken?.has(c)) drawn.add(c);
    }
    const taken = await existingTagCodes([...drawn], tx);
    for (const c of drawn) if (!taken.has(c)) codes.add(c);
  }
  return [...codes];
}

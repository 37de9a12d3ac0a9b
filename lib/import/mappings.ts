import "server-only";
import { audited } from "@/db/audit";
import * as imports from "@/db/imports";
import { can } from "@/lib/auth/roles";
import type { Principal } from "@/lib/auth/session";
import { forbidden } from "@/lib/http/errors";

// Column mappings saved by name, for the next file from the same supplier.

/** Saves the owner's column choices by name, for the next file from the same supplier. */
export async function saveMapping(actor: Principal, name: string, mapping: Record<string, string | null>): Promise<string> {
  if (!can(actor, "stock.import")) throw forbidden();
  return audited(actor, async (tx, audit) => {
    const id = await imports.upsertMapping(actor.organisationId, name, mapping, actor.userId, tx);
    await audit({ action: "import_mapping.saved", entity: "import_mapping", entityId: id, after: { name, mapping } });
    return id;
  });
}

/** Removes a saved mapping; answers whether there was one. */
export async function deleteMapping(actor: Principal, id: string): Promise<boolean> {
  if (!can(actor, "stock.import")) throw forbidden();
  return audited(actor, async (tx, audit) => {
    const gone = await imports.deleteMapping(actor.organisationId, id, tx);
    if (gone) await audit({ action: "import_mapping.deleted", entity: "import_mapping", entityId: id });
    return gone;
  });
}

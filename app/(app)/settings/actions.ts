"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { db } from "@/db";
import { writeAudit } from "@/db/audit";
import { getOrganisation, updateOrganisation } from "@/db/people";
import { formAction } from "@/lib/auth/action";
import { createApiToken, revokeToken } from "@/lib/auth/api-tokens";
import { flagField, nameField, roleField } from "@/lib/auth/schemas";

export const saveOrganisationAction = formAction(
  "settings.manage",
  z.object({ name: nameField, publicTagView: flagField }),
  async (input, principal) => {
    const before = await getOrganisation(principal.organisationId);
    await db.transaction(async (trx) => {
      await updateOrganisation(principal.organisationId, input, trx);
      await writeAudit({ organisationId: principal.organisationId, actorId: principal.userId, action: "organisation.updated", entity: "organisation", entityId: principal.organisationId, before, after: input }, trx);
    });
    revalidatePath("/", "layout");
    return { ok: true, message: "Settings saved." };
  },
);

export const createTokenAction = formAction(
  "settings.manage",
  z.object({ name: nameField, role: roleField }),
  async (input, principal) => {
    const secret = await createApiToken(principal, input);
    revalidatePath("/settings");
    return { ok: true, message: "Token created. Copy it now: it is shown only once.", values: { secret } };
  },
);

export const revokeTokenAction = formAction(
  "settings.manage",
  z.object({ tokenId: z.uuid("That token id is not valid.") }),
  async ({ tokenId }, principal) => {
    await revokeToken(principal, tokenId);
    revalidatePath("/settings");
    return { ok: true, message: "Token revoked." };
  },
);

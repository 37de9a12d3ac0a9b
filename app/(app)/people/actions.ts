"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { formAction } from "@/lib/auth/action";
import { invitePerson, updatePerson, withdrawInvite } from "@/lib/auth/accounts";
import { flagField, inviteSchema, roleField } from "@/lib/auth/schemas";

export const inviteAction = formAction("people.manage", inviteSchema, async (input, principal) => {
  await invitePerson(principal, input);
  revalidatePath("/people");
  return { ok: true, message: `Invite sent to ${input.email}. The link works for 7 days.` };
});

const personUpdateForm = z.object({
  userId: z.string().min(1),
  role: roleField,
  designated: flagField,
  disabled: flagField,
});

export const updatePersonAction = formAction("people.manage", personUpdateForm, async (input, principal) => {
  const { userId, ...patch } = input;
  await updatePerson(principal, userId, patch);
  revalidatePath("/people");
  return { ok: true, message: "Saved." };
});

export const withdrawInviteAction = formAction(
  "people.manage",
  z.object({ inviteId: z.uuid("That invite id is not valid.") }),
  async ({ inviteId }, principal) => {
    await withdrawInvite(principal, inviteId);
    revalidatePath("/people");
    return { ok: true, message: "Invite withdrawn." };
  },
);

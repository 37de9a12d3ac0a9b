"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import { formAction } from "@/lib/auth/action";
import { uuidParam } from "@/lib/http/errors";
import { itemFormSchema } from "@/lib/stock/schemas";
import { createItem, editItem } from "@/lib/stock/service";

export const createItemAction = formAction("stock.edit", itemFormSchema, async (input, principal) => {
  const id = await createItem(principal, input);
  revalidatePath("/stock");
  redirect(`/items/${id}?added=1`);
});

export const editItemAction = formAction(
  "stock.edit",
  z.preprocess((raw) => ({ ...(raw as object), input: raw }), z.object({ itemId: z.string(), input: itemFormSchema })),
  async ({ itemId, input }, principal) => {
    const id = uuidParam(itemId);
    await editItem(principal, id, input);
    revalidatePath(`/items/${id}`);
    redirect(`/items/${id}`);
  },
);

"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { formAction } from "@/lib/auth/action";
import { itemEventSchema } from "@/lib/stock/api-schemas";
import { recordItemEvent } from "@/lib/stock/events";
import { attachCertificate } from "@/lib/stock/service";
import { uuidParam } from "@/lib/http/errors";
import { toInches } from "@/lib/securement/units";

// Form fields → the API's event body, so forms and API share one schema and one service.
function answersFrom(form: Record<string, unknown>) {
  return Object.entries(form)
    .filter(([k]) => k.startsWith("defect_"))
    .map(([k, v]) => ({ id: k.slice("defect_".length), defect: v === "yes" }));
}

function measurementsFrom(form: Record<string, unknown>) {
  const out: Record<string, number> = {};
  for (const [k, v] of Object.entries(form)) {
    if (!k.startsWith("m_") || typeof v !== "string" || v.trim() === "") continue;
    const unitMm = form[`unit_${k.slice(2)}`] === "mm";
    const n = Number(v.replace(",", "."));
    out[k.slice(2)] = Number.isFinite(n) ? (unitMm ? toInches({ value: n, unit: "mm" }).value : n) : Number.NaN;
  }
  return out;
}

const file = z.instanceof(File).optional();

// One flat object (the event's fields beside the item id and the files), so that a refusal's
// path is the form's own field name ("note", "reason", "verdict"), marked on the form.
const eventForm = z.preprocess(
  (raw) => {
    const form = raw as Record<string, unknown>;
    const type = form.type;
    const base = { type, note: form.note || undefined, reason: form.reason, eventId: form.eventId ? Number(form.eventId) : undefined, itemId: form.itemId };
    if (type === "check") return { ...base, answers: answersFrom(form), photo: form.photo };
    if (type === "inspection") {
      return { ...base, answers: answersFrom(form), measurements: measurementsFrom(form), verdict: form.verdict, certificate: form.certificate };
    }
    return { ...base, photo: form.photo };
  },
  z.intersection(z.object({ itemId: z.string(), photo: file, certificate: file }), itemEventSchema),
);

const DONE: Record<string, string> = {
  tag_out: "Tagged out: do not use. Set it aside and hang a red tag on it. The owners have been e-mailed.",
  inspection: "Inspection recorded.",
  return_to_service: "Returned to service.",
  retired: "Retired. It stays in the records.",
  lost: "Marked lost.",
  found: "Marked found. It stays tagged out until someone inspects it.",
  correction: "Correction recorded. The original entry stays in the history.",
};

export const itemEventAction = formAction("items.check", eventForm, async ({ itemId, photo, certificate, ...body }, principal) => {
  const id = uuidParam(itemId);
  const result = await recordItemEvent(principal, id, body, { photo, certificate });
  revalidatePath(`/items/${id}`);
  if (body.type === "check" && result && "outcome" in result) {
    return result.outcome === "pass"
      ? { ok: true, message: "Check passed: no defects found. It may be used today; if you see damage later, stop and tag it out." }
      : { ok: true, tone: "stop", message: "Tagged out: do not use. Set it aside and hang a red tag on it. The owners have been e-mailed." };
  }
  return { ok: true, message: DONE[body.type] ?? "Recorded." };
});

export const certificateAction = formAction(
  "stock.edit",
  z.object({ itemId: z.string(), certificate: z.instanceof(File, { error: "Choose a file." }) }),
  async ({ itemId, certificate }, principal) => {
    const id = uuidParam(itemId);
    await attachCertificate(principal, id, certificate);
    revalidatePath(`/items/${id}`);
    return { ok: true, message: "Document stored with the item." };
  },
);

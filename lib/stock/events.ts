import "server-only";
import type { Principal } from "@/lib/auth/session";
import type { ItemEventBody } from "./api-schemas";
import * as stock from "./service";

/** One entry point for recording any event on an item, used by the API and the forms. */
export async function recordItemEvent(actor: Principal, itemId: string, body: ItemEventBody, files: { photo?: File | null; certificate?: File | null } = {}) {
  switch (body.type) {
    case "check":
      return stock.recordPreUseCheck(actor, itemId, { answers: body.answers, note: body.note, photo: files.photo });
    case "tag_out":
      return stock.tagOut(actor, itemId, { note: body.note, photo: files.photo });
    case "inspection":
      return stock.recordInspection(actor, itemId, { answers: body.answers, measurements: body.measurements, verdict: body.verdict, note: body.note, certificate: files.certificate });
    case "return_to_service":
      return stock.changeWithReason(actor, itemId, "return_to_service", body.reason);
    case "retired":
      return stock.changeWithReason(actor, itemId, "retire", body.reason);
    case "lost":
      return stock.changeWithReason(actor, itemId, "lost", body.reason);
    case "found":
      return stock.changeWithReason(actor, itemId, "found", body.reason);
    case "correction":
      return stock.correctEvent(actor, itemId, body.eventId, body.note);
  }
}

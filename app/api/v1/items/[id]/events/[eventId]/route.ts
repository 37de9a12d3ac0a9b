import { route } from "@/lib/http/route";

// The service history is append-only: an event is never changed or removed. A mistake is
// answered by a new event of type "correction" that points at it.
const refuse = route("stock.view", {}, async () =>
  Response.json(
    { error: "The service history is append-only. Record a correction event instead.", issues: [] },
    { status: 405, headers: { Allow: "GET" } },
  ),
);

export const PUT = refuse;
export const PATCH = refuse;
export const DELETE = refuse;

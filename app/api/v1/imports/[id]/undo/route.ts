import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { undoImport } from "@/lib/import/undo";

/** Undoes an import whose items have not been used since (see undoImport for what that means). */
export const POST = route("stock.import", {}, async ({ principal, params }) => {
  const result = await undoImport(principal, uuidParam(params.id, "import"));
  return { undone: true, ...result };
});

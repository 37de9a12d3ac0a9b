import { listBatches } from "@/db/imports";
import { importParamsSchema } from "@/lib/import/api-schemas";
import { MAX_IMPORT_BYTES } from "@/lib/import/file-check";
import { badRequest, fieldError, zodIssues } from "@/lib/http/errors";
import { spoolMultipart } from "@/lib/http/multipart";
import { route } from "@/lib/http/route";
import { batchJson } from "@/lib/import/answers";
import { importStock } from "@/lib/import/commit";

/** The organisation's imports, newest first. */
export const GET = route("stock.import", {}, async ({ principal }) => {
  const batches = await listBatches(principal.organisationId);
  return { data: batches.map((b) => batchJson(b)) };
});

/**
 * Checks (dryRun=true) or imports a CSV file of stock: multipart field `file`, optional
 * `mapping` (JSON), `validOnly=true` to import the valid rows and keep the rejected ones.
 * A commit with any rejected row and no validOnly answers 422 and writes nothing.
 */
export const POST = route("stock.import", {}, async ({ principal, request }) => {
  const upload = await spoolMultipart(request, { fileField: "file", maxFileBytes: MAX_IMPORT_BYTES });
  try {
    const params = importParamsSchema.safeParse({ ...Object.fromEntries(new URL(request.url).searchParams), ...upload.fields });
    if (!params.success) throw badRequest("Some fields need fixing.", zodIssues(params.error));
    if (!upload.file) throw fieldError("file", "Choose a CSV file.");
    const answer = await importStock(principal, { file: upload.file, ...params.data });
    return Response.json(answer.body, { status: answer.status });
  } finally {
    await upload.cleanup();
  }
});

import { route } from "@/lib/http/route";
import { savedCheckInputSchema } from "@/lib/securement";
import { listSavedChecks, saveCheck } from "@/lib/securement-checks/service";

// Load checks saved by name. Every role may list and save them (every role may run checks);
// see lib/securement-checks/service.ts for who may change or delete one.

/** The organisation's saved checks, most recently changed first. */
export const GET = route("securement.check", {}, async ({ principal }) => ({ data: await listSavedChecks(principal) }));

/** Saves a check under a new name: 201 with the saved check and its answer; 409 when the name is taken. */
export const POST = route("securement.check", { body: savedCheckInputSchema }, async ({ principal, body }) => Response.json(await saveCheck(principal, body), { status: 201 }));

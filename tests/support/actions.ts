import { readFileSync } from "node:fs";
import path from "node:path";
import type { Client } from "./http";

// Server actions called over HTTP the way React calls them, so tests can walk them with
// any session. The action ids come from the build's manifest.

const ROOT = path.resolve(__dirname, "../..");

export interface ActionRef {
  id: string;
  page: string; // a page that imports the action, where React posts it
}

export function discoveredActions(): Map<string, ActionRef> {
  const manifest = JSON.parse(readFileSync(path.join(ROOT, ".next/server/server-reference-manifest.json"), "utf8"));
  const out = new Map<string, ActionRef>();
  for (const [id, entry] of Object.entries<{ filename: string; exportedName: string; workers: Record<string, unknown> }>(manifest.node)) {
    const worker = Object.keys(entry.workers)[0]; // e.g. "app/(app)/people/page"
    const page = "/" + worker.replace(/^app\//, "").replace(/\([^)]*\)\/?/g, "").replace(/\/?page$/, "");
    out.set(`${entry.filename}#${entry.exportedName}`, { id, page });
  }
  return out;
}

/** Calls a server action the way React does: the form's fields, behind its previous state. */
export async function callAction(client: Client, action: ActionRef, fields: Record<string, string | Blob> = {}) {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) {
    if (typeof v === "string") form.append(`_1_${k}`, v);
    else form.append(`_1_${k}`, v, (v as File).name ?? "upload");
  }
  form.append("0", JSON.stringify([{}, "$K1"])); // the root goes last, as React sends it
  const res = await client.request("POST", action.page, form, { "next-action": action.id });
  return res.text;
}


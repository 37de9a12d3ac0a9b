import { db } from "@/db";

export const dynamic = "force-dynamic";

/** Liveness for scripts: the app answers and reaches its database. */
export async function GET() {
  await db.raw("select 1");
  return Response.json({ ok: true });
}

import { ping } from "@/db";

export const dynamic = "force-dynamic";

/** Liveness for scripts: the app answers and reaches its database. */
export async function GET() {
  await ping();
  return Response.json({ ok: true });
}

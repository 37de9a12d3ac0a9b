import { ping } from "@/db";
import { DATABASE_DOWN, isConnectionFailure } from "@/lib/http/unavailable";

export const dynamic = "force-dynamic";

/** Liveness for scripts: the app answers and reaches its database (503 in words when it cannot). */
export async function GET() {
  try {
    await ping();
  } catch (error) {
    if (!isConnectionFailure(error)) throw error;
    return Response.json({ ok: false, error: DATABASE_DOWN }, { status: 503, headers: { "Cache-Control": "no-store" } });
  }
  return Response.json({ ok: true }, { headers: { "Cache-Control": "no-store" } });
}

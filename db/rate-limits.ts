import { db } from "./index";

// Counted attempts for the limits of lib/auth/mail-limits.ts.

/**
 * Counts an attempt against a limit, unless `limit` attempts were already counted for this
 * bucket and key in the last `windowSeconds`; answers whether it was counted. One
 * transaction-scoped advisory lock per bucket and key makes check-and-count atomic across
 * app processes. Rows older than the window are removed as the key is used.
 */
export async function takeRateLimitHit(bucket: string, key: string, limit: number, windowSeconds: number): Promise<boolean> {
  return db.transaction(async (trx) => {
    await trx.raw("select pg_advisory_xact_lock(hashtextextended(?, 0))", [`${bucket} ${key}`]);
    const since = trx.raw("now() - make_interval(secs => ?)", [windowSeconds]);
    await trx("rate_limit_hits").where({ bucket, key }).where("at", "<=", since).delete();
    const row = await trx("rate_limit_hits").where({ bucket, key }).count<{ count: string }>("id as count").first();
    if (Number(row?.count ?? 0) >= limit) return false;
    await trx("rate_limit_hits").insert({ bucket, key });
    return true;
  });
}

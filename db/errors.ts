// PostgreSQL's refusals, read in one place so that services never parse driver errors.

/** A write that a unique key refused (SQLSTATE 23505): the key's name and PostgreSQL's detail. */
export interface UniqueRefusal {
  key: string;
  detail: string;
}

/** The unique key that refused a write, or null for any other error. */
export function uniqueRefusal(error: unknown): UniqueRefusal | null {
  if (typeof error !== "object" || error === null) return null;
  const e = error as { code?: string; constraint?: string; detail?: string };
  return e.code === "23505" ? { key: String(e.constraint ?? ""), detail: e.detail ?? "" } : null;
}

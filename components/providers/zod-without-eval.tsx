"use client";
import { z } from "zod";

// zod 4 probes once whether it may compile parsers with `new Function`. The pages' CSP
// allows no eval (lib/http/security-headers.ts): the probe fails harmlessly but is reported
// as a policy violation. Jitless mode skips the probe; parsing stays correct.
z.config({ jitless: true });

/** Rendered once by the root layout, so this module runs before any form parses. */
export function ZodWithoutEval() {
  return null;
}

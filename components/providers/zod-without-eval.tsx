"use client";
import { config } from "zod/v4/core";

// zod 4 probes once whether it may compile parsers with `new Function`. The pages' CSP
// allows no eval (lib/http/security-headers.ts): the probe fails harmlessly but is reported
// as a policy violation. Jitless mode skips the probe; parsing stays correct. Only zod's
// `config` is imported here (its settings are one global object that every zod import reads),
// so the root layout does not put all of zod into every page's first load.
config({ jitless: true });

/** Rendered once by the root layout, so this module runs before any form parses. */
export function ZodWithoutEval() {
  return null;
}

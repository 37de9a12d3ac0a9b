"use client";
import { config } from "zod/v4/core";

// zod 4 probes once whether it may compile parsers with `new Function`. The pages' CSP
// allows no eval (lib/http/security-headers.ts): the probe fails harmlessly but is reported
// as a policy violation. Jitless mode skips the probe; parsing stays correct. In the browser
// only: this module is also run on the server to render the page, and zod's settings are one
// object per process, which would make every server-side parse jitless (slower) too. Only
// zod's `config` is imported, so the root layout does not put all of zod into every page.
if (typeof window !== "undefined") config({ jitless: true });

/** Rendered once by the root layout, so this module runs before any form parses. */
export function ZodWithoutEval() {
  return null;
}

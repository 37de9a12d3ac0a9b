// The one zod-issue mapper: dotted paths, unknown keys at their own path.
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { zodIssues } from "@/lib/field-issues";
import { securementCheckRequestSchema } from "@/lib/securement";

describe("zodIssues", () => {
  it("gives dotted paths", () => {
    const schema = z.object({ tiedowns: z.array(z.object({ wll: z.number() })) });
    const r = schema.safeParse({ tiedowns: [{ wll: 1 }, { wll: "x" }] });
    expect(zodIssues(r.error!)).toEqual([{ path: "tiedowns.1.wll", message: expect.any(String) }]);
  });

  it("reports each unknown key of a strict object at its own path", () => {
    const schema = z.object({ parts: z.array(z.strictObject({ wll: z.number().optional() })) });
    const r = schema.safeParse({ parts: [{ wl: 5, colour: "red" }] });
    expect(zodIssues(r.error!)).toEqual([
      { path: "parts.0.wl", message: 'Unknown field "wl"' },
      { path: "parts.0.colour", message: 'Unknown field "colour"' },
    ]);
  });

  it("reports an unknown key at the top level without a leading dot", () => {
    const r = z.strictObject({}).safeParse({ colour: "red" });
    expect(zodIssues(r.error!)).toEqual([{ path: "colour", message: 'Unknown field "colour"' }]);
  });

  it("maps the securement request schema's issues the same way", () => {
    const r = securementCheckRequestSchema.safeParse({ cargo: { weight: { value: 0, unit: "lb" }, length: { value: 16, unit: "ft" }, kind: "machine" }, tiedowns: [], extra: 1 });
    expect(zodIssues(r.error!)).toEqual([
      { path: "cargo.weight.value", message: "The value must be greater than 0" },
      { path: "extra", message: 'Unknown field "extra"' },
    ]);
  });
});

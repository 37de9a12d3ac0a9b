// The one zod-issue mapper: dotted paths, unknown keys at their own path.
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { plainWords, zodIssues } from "@/lib/field-issues";
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

  it("never passes zod's developer English on: each default message gets plain words", () => {
    const schema = z.object({
      cost: z.coerce.number().int(),
      count: z.number().min(1),
      size: z.number().positive(),
      name: z.string().min(1).max(5),
      email: z.email(),
      yardId: z.uuid(),
      kind: z.enum(["chain", "binder"]),
      missing: z.string(),
      flag: z.boolean(),
    });
    const r = schema.safeParse({ cost: "abc", count: 0, size: 0, name: "toolong", email: "x", yardId: "y", kind: "rope", flag: "maybe" });
    const byPath = Object.fromEntries(zodIssues(r.error!).map((i) => [i.path, i.message]));
    expect(byPath).toEqual({
      cost: "Enter a number, in figures.",
      count: "Enter a number of at least 1.",
      size: "Enter a number greater than 0.",
      name: "Keep this to 5 characters or fewer.",
      email: "Enter an e-mail address, like name@example.com.",
      yardId: "Choose from the list.",
      kind: "Choose one of: chain, binder.",
      missing: "Fill this in.",
      flag: "Answer yes or no.",
    });
    for (const message of Object.values(byPath)) expect(message).not.toMatch(/Invalid|expected|received|NaN/);
  });

  it("keeps a schema's own words as they are", () => {
    const r = z.object({ wll: z.number({ error: "Enter the WLL as a number." }) }).safeParse({ wll: "x" });
    expect(zodIssues(r.error!)).toEqual([{ path: "wll", message: "Enter the WLL as a number." }]);
    expect(plainWords({ path: [], message: "Say what is wrong." })).toBe("Say what is wrong.");
  });
});

import { describe, expect, it } from "vitest";
import { z } from "zod";
import { AppError, zodIssues } from "@/lib/http/errors";

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
});

describe("AppError", () => {
  it("carries an optional extra payload, empty by default", () => {
    expect(new AppError(404, "No such size").extra).toEqual({});
    expect(new AppError(404, "No such size", [], { nearest: ["1/2 in"] }).extra).toEqual({ nearest: ["1/2 in"] });
  });
});

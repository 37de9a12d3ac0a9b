import { describe, expect, it } from "vitest";
import { zodIssues as sharedMapper } from "@/lib/field-issues";
import { AppError, zodIssues } from "@/lib/http/errors";

describe("AppError", () => {
  it("carries an optional extra payload, empty by default", () => {
    expect(new AppError(404, "No such size").extra).toEqual({});
    expect(new AppError(404, "No such size", [], { nearest: ["1/2 in"] }).extra).toEqual({ nearest: ["1/2 in"] });
  });
});

describe("zod issues", () => {
  it("are mapped by the one shared function (lib/field-issues.ts), not a copy", () => {
    expect(zodIssues).toBe(sharedMapper);
  });
});

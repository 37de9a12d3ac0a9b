import { describe, expect, it } from "vitest";
import { AUDIT_WORDS, auditWords } from "@/lib/audit/actions";

describe("auditWords", () => {
  it("says every action in words, each differently", () => {
    const words = Object.values(AUDIT_WORDS);
    expect(new Set(words).size).toBe(words.length);
    for (const action of Object.keys(AUDIT_WORDS)) expect(auditWords(action)).not.toMatch(/[._]/);
  });
  it("reads an action it does not know in its plain form", () => {
    expect(auditWords("kit.checked_out")).toBe("Kit checked out");
  });
});

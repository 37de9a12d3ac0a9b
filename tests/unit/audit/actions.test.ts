import { describe, expect, it } from "vitest";
import { actionsOfKind, AUDIT_KINDS, AUDIT_WORDS, auditKindWords, auditSubject, auditWords, type AuditKind } from "@/lib/audit/actions";

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

describe("kinds of change", () => {
  it("puts every action in exactly one kind", () => {
    const all = (Object.keys(AUDIT_KINDS) as AuditKind[]).flatMap(actionsOfKind);
    expect(all.sort()).toEqual(Object.keys(AUDIT_WORDS).sort());
  });
  it("says the kind in words, and Other for an action no longer in the set", () => {
    expect(auditKindWords("item.check_fail")).toBe("Checks, inspections and tag-outs");
    expect(auditKindWords("kit.checked_out")).toBe("Other");
    expect(actionsOfKind("imports")).toEqual(["items.imported", "items.import_undone", "import_mapping.saved", "import_mapping.deleted"]);
  });
});

describe("auditSubject", () => {
  it("names the thing, and quotes the reason given", () => {
    expect(auditSubject({ entity: "item", label: "3X4K-9P2M", after: { status: "retired", reason: "Bent hook" } })).toBe("Item 3X4K-9P2M: “Bent hook”");
    expect(auditSubject({ entity: "kit", label: "Hollins driveway", after: null })).toBe("Kit Hollins driveway");
    expect(auditSubject({ entity: "api_token", label: null, after: { note: 5 } })).toBe("API token");
  });
});

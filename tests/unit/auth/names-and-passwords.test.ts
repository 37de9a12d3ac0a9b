import { describe, expect, it } from "vitest";
import { NAME_HAS_CONTROL, NAME_NOT_VISIBLE, nameProblem } from "@/lib/auth/names";
import { COMMON_PASSWORD, PASSWORD_IS_EMAIL, isCommonPassword, passwordProblem } from "@/lib/auth/password-policy";
import { nameField, signUpSchema } from "@/lib/auth/schemas";

describe("issue 11.6: names carry no control characters (nameProblem)", () => {
  it("refuses line breaks, tabs, escapes and Unicode line separators", () => {
    for (const name of ["Yard Co\nBcc: x@example.com", "Yard\rCo", "Yard\tCo", "Yard\u001bCo", "Yard\u0085Co", "Yard\u2028Co"]) {
      expect(nameProblem(name), JSON.stringify(name)).toBe(NAME_HAS_CONTROL);
    }
  });

  it("refuses a name of only invisible or direction-changing characters, and takes any script", () => {
    for (const name of ["\u200b", "\u202e\u2066", "\u00a0\u200d", "---", "\u200f."]) expect(nameProblem(name), JSON.stringify(name)).toBe(NAME_NOT_VISIBLE);
    for (const name of ["Åsa Öberg", "Zoë", "محمد", "李雷", "O'Brien & Sons", "Crew 7", "Eve \u202egnp"]) expect(nameProblem(name), name).toBeNull();
  });

  it("is what the name field of every form and route says", () => {
    const r = nameField.safeParse("Line\nbreak");
    expect(r.success ? null : r.error.issues[0].message).toBe(NAME_HAS_CONTROL);
  });
});

describe("issue 11.7: weak passwords (passwordProblem)", () => {
  it("knows common passwords from the maintained list, in any case", () => {
    for (const p of ["1234567890", "qwertyuiop", "QWERTYUIOP", "password123"]) expect(isCommonPassword(p), p).toBe(true);
    expect(isCommonPassword("tilt-deck-binder-ratchet")).toBe(false);
  });

  it("refuses the e-mail address as the password, in any case", () => {
    expect(passwordProblem("Olive@Corvid.example", "olive@corvid.example")).toBe(PASSWORD_IS_EMAIL);
    expect(passwordProblem("a-long-own-passphrase", "olive@corvid.example")).toBeNull();
    expect(passwordProblem("qwertyuiop")).toBe(COMMON_PASSWORD);
  });

  it("puts both problems on the password field of the sign-up", () => {
    const base = { organisationName: "Yard Co", name: "Olive", email: "olive@corvid.example" };
    const same = signUpSchema.safeParse({ ...base, password: "OLIVE@corvid.example" });
    expect(same.success ? [] : same.error.issues.map((i) => [i.path.join("."), i.message])).toEqual([["password", PASSWORD_IS_EMAIL]]);
    const common = signUpSchema.safeParse({ ...base, password: "1234567890" });
    expect(common.success ? [] : common.error.issues.map((i) => [i.path.join("."), i.message])).toEqual([["password", COMMON_PASSWORD]]);
  });
});

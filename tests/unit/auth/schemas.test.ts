import { describe, expect, it } from "vitest";
import { inviteSchema, signUpSchema } from "@/lib/auth/schemas";

describe("account schemas", () => {
  it("normalise e-mail case and spaces", () => {
    const r = inviteSchema.parse({ email: "  Yara@Example.COM ", role: "planner" });
    expect(r.email).toBe("yara@example.com");
    expect(r.designated).toBe(false);
  });
  it("name the field at fault", () => {
    const r = signUpSchema.safeParse({ organisationName: "", name: "A", email: "not-an-email", password: "short" });
    expect(r.success).toBe(false);
    const paths = r.error!.issues.map((i) => i.path.join("."));
    expect(paths).toEqual(expect.arrayContaining(["organisationName", "email", "password"]));
    expect(r.error!.issues.find((i) => i.path[0] === "email")!.message).toMatch(/valid e-mail/);
  });
  it("read checkbox values from forms and JSON", () => {
    expect(inviteSchema.parse({ email: "a@b.example", role: "owner", designated: "on" }).designated).toBe(true);
    expect(inviteSchema.parse({ email: "a@b.example", role: "owner", designated: true }).designated).toBe(true);
    expect(inviteSchema.safeParse({ email: "a@b.example", role: "boss" }).success).toBe(false);
  });
});

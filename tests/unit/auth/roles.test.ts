import { describe, expect, it } from "vitest";
import { can, isRole, lowerRole, ROLES, type Permission, type Role } from "@/lib/auth/roles";

// The matrix as the product's domain notes state it (owner / planner / yard hand), written
// out literally here so that a change to lib/auth/roles.ts has to be made on purpose.
const EXPECTED: Record<Permission, Role[]> = {
  "people.manage": ["owner"],
  "settings.manage": ["owner"],
  "stock.view": ["owner", "planner", "yard_hand"],
  "stock.edit": ["owner", "planner"],
  "stock.import": ["owner"],
  "stock.retire": ["owner"],
  "items.check": ["owner", "planner", "yard_hand"],
  "items.inspect": ["owner"],
  "fleet.manage": ["owner", "planner"],
  "fleet.view": ["owner", "planner", "yard_hand"],
  "kits.load": ["owner", "planner", "yard_hand"],
  "securement.check": ["owner", "planner", "yard_hand"],
  "reports.view": ["owner", "planner"],
  "records.view": ["owner"],
  "audit.view": ["owner"],
  "mail.preferences": ["owner", "planner", "yard_hand"],
};

describe("can", () => {
  for (const [permission, roles] of Object.entries(EXPECTED) as [Permission, Role[]][]) {
    for (const role of ["owner", "planner", "yard_hand"] as Role[]) {
      it(`${role} ${roles.includes(role) ? "may" : "may not"} ${permission}`, () => {
        expect(can({ role, designated: false }, permission)).toBe(roles.includes(role));
      });
    }
  }

  it("lets a designated person of any role do periodic inspections and hand over their record, and nothing more", () => {
    expect(can({ role: "yard_hand", designated: true }, "items.inspect")).toBe(true);
    expect(can({ role: "planner", designated: true }, "items.inspect")).toBe(true);
    expect(can({ role: "yard_hand", designated: true }, "records.view")).toBe(true);
    expect(can({ role: "planner", designated: true }, "audit.view")).toBe(false);
    expect(can({ role: "yard_hand", designated: true }, "stock.edit")).toBe(false);
    expect(can({ role: "yard_hand", designated: true }, "people.manage")).toBe(false);
  });
});

describe("isRole", () => {
  it("accepts the three roles only", () => {
    expect(isRole("planner")).toBe(true);
    expect(isRole("admin")).toBe(false);
    expect(isRole(undefined)).toBe(false);
  });
});

describe("lowerRole", () => {
  it.each([
    ["owner", "owner", "owner"],
    ["owner", "planner", "planner"],
    ["planner", "owner", "planner"],
    ["owner", "yard_hand", "yard_hand"],
    ["yard_hand", "planner", "yard_hand"],
  ] as [Role, Role, Role][])("%s and %s: %s", (a, b, lower) => expect(lowerRole(a, b)).toBe(lower));

  it("never grants a permission that either role lacks", () => {
    for (const a of ROLES) for (const b of ROLES) for (const p of Object.keys(EXPECTED) as Permission[]) {
      const low = { role: lowerRole(a, b), designated: false };
      if (can(low, p)) expect(can({ role: a, designated: false }, p) && can({ role: b, designated: false }, p)).toBe(true);
    }
  });
});

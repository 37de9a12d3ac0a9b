import { describe, expect, it } from "vitest";
import { can, isRole, type Permission, type Role } from "@/lib/auth/roles";

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
  "audit.view": ["owner"],
};

describe("can", () => {
  for (const [permission, roles] of Object.entries(EXPECTED) as [Permission, Role[]][]) {
    for (const role of ["owner", "planner", "yard_hand"] as Role[]) {
      it(`${role} ${roles.includes(role) ? "may" : "may not"} ${permission}`, () => {
        expect(can({ role, designated: false }, permission)).toBe(roles.includes(role));
      });
    }
  }

  it("lets a designated person of any role do periodic inspections, and nothing more", () => {
    expect(can({ role: "yard_hand", designated: true }, "items.inspect")).toBe(true);
    expect(can({ role: "planner", designated: true }, "items.inspect")).toBe(true);
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

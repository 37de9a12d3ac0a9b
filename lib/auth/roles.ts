// Who may do what. Pure data and one function, so the matrix is readable in one place
// and tested on its own (tests/unit/auth/roles.test.ts).

export const ROLES = ["owner", "planner", "yard_hand"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  owner: "Owner",
  planner: "Planner",
  yard_hand: "Yard hand",
};

/** Everything a signed-in person can ask to do. */
export type Permission =
  | "people.manage" // invite, change roles, designate inspectors
  | "settings.manage" // organisation settings, API tokens
  | "stock.view" // stock list, item pages, scanning
  | "stock.edit" // add, edit, move items
  | "stock.import" // CSV import
  | "stock.retire"
  | "items.check" // pre-use check, report damage (tag-out)
  | "items.inspect" // periodic inspection, return to service: owner or designated person
  | "fleet.manage" // machines, trailers, kits
  | "fleet.view"
  | "kits.load" // load a kit onto the trailer and return it, by scanning its items
  | "securement.check" // rated-limit lookup and scratch securement check
  | "reports.view" // the dashboard's charts: owners and planners (kits and due items)
  | "records.view" // the inspection and service record for auditors: owner or designated person
  | "audit.view"
  | "mail.preferences"; // choose one's own reminder e-mails

const GRANTS: Record<Role, readonly Permission[]> = {
  owner: [
    "people.manage", "settings.manage", "stock.view", "stock.edit", "stock.import", "stock.retire",
    "items.check", "items.inspect", "fleet.manage", "fleet.view", "kits.load", "securement.check",
    "reports.view", "records.view", "audit.view", "mail.preferences",
  ],
  planner: ["stock.view", "stock.edit", "items.check", "fleet.manage", "fleet.view", "kits.load", "securement.check", "reports.view", "mail.preferences"],
  yard_hand: ["stock.view", "items.check", "fleet.view", "kits.load", "securement.check", "mail.preferences"],
};

/**
 * Permissions that a designated person gets whatever the role: periodic inspection, and the
 * record of inspections and service that an auditor or insurer asks them to hand over.
 */
const DESIGNATED_GRANTS: readonly Permission[] = ["items.inspect", "records.view"];

export interface Actor {
  role: Role;
  designated: boolean;
}

/**
 * Whether an actor holds a permission.
 * @example can({ role: "yard_hand", designated: true }, "items.inspect") // true
 */
export function can(actor: Actor, permission: Permission): boolean {
  if (GRANTS[actor.role].includes(permission)) return true;
  return actor.designated && DESIGNATED_GRANTS.includes(permission);
}

/** How much a role may do: each role may do all that a lower one may (see GRANTS). */
const RANK: Record<Role, number> = { yard_hand: 0, planner: 1, owner: 2 };

/**
 * The lesser of two roles: what an API token acts as, given its own role and its maker's.
 * @example lowerRole("owner", "yard_hand") // "yard_hand"
 */
export function lowerRole(a: Role, b: Role): Role {
  return RANK[a] <= RANK[b] ? a : b;
}

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}

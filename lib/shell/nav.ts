import { can, type Actor, type Permission } from "@/lib/auth/roles";

export interface NavEntry {
  href: string;
  label: string;
  icon: "home" | "stock" | "people" | "settings" | "audit";
  permission?: Permission;
}

const ENTRIES: readonly NavEntry[] = [
  { href: "/", label: "Today", icon: "home" },
  { href: "/stock", label: "Stock", icon: "stock", permission: "stock.view" },
  { href: "/people", label: "People", icon: "people", permission: "people.manage" },
  { href: "/audit", label: "Audit log", icon: "audit", permission: "audit.view" },
  { href: "/settings", label: "Settings", icon: "settings", permission: "settings.manage" },
];

/**
 * The navigation a role sees: only what it may open.
 * @example navFor({ role: "yard_hand", designated: false }).map((e) => e.href) // ["/", "/stock"]
 */
export function navFor(actor: Actor): NavEntry[] {
  return ENTRIES.filter((e) => !e.permission || can(actor, e.permission));
}

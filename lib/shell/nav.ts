import { can, type Actor, type Permission } from "@/lib/auth/roles";

export type NavIconName = "home" | "scan" | "stock" | "kits" | "machines" | "trailers" | "check" | "ratings" | "people" | "settings" | "audit" | "records" | "mail" | "more";

export interface NavEntry {
  href: string;
  label: string;
  icon: NavIconName;
  permission?: Permission;
  /** Shown in the phone's bottom bar; the rest sit behind "More". */
  primary?: boolean;
}

const ENTRIES: readonly NavEntry[] = [
  { href: "/", label: "Today", icon: "home", primary: true },
  { href: "/scan", label: "Scan", icon: "scan", permission: "stock.view", primary: true },
  { href: "/stock", label: "Stock", icon: "stock", permission: "stock.view", primary: true },
  // The planner's main job, and the yard hand's loading list: in the phone's bottom bar.
  { href: "/kits", label: "Kits", icon: "kits", permission: "fleet.view", primary: true },
  { href: "/check", label: "Load check", icon: "check", permission: "securement.check" },
  { href: "/machines", label: "Machines", icon: "machines", permission: "fleet.view" },
  { href: "/trailers", label: "Trailers", icon: "trailers", permission: "fleet.view" },
  { href: "/ratings", label: "WLL lookup", icon: "ratings", permission: "securement.check" },
  { href: "/people", label: "People", icon: "people", permission: "people.manage" },
  { href: "/records", label: "Records", icon: "records", permission: "records.view" },
  { href: "/audit", label: "Audit log", icon: "audit", permission: "audit.view" },
  { href: "/settings", label: "Settings", icon: "settings", permission: "settings.manage" },
  { href: "/preferences", label: "E-mail", icon: "mail", permission: "mail.preferences" },
];

/**
 * The navigation a role sees: only what it may open.
 * @example navFor({ role: "yard_hand", designated: false }).map((e) => e.href) // ["/", "/scan", "/stock", "/kits", "/check", "/machines", "/trailers", "/ratings", "/preferences"]
 */
export function navFor(actor: Actor): NavEntry[] {
  return ENTRIES.filter((e) => !e.permission || can(actor, e.permission));
}

/**
 * What the phone's "More" page lists: the entries the bottom bar has no room for (never one
 * the bar already shows).
 * @example moreFor({ role: "yard_hand", designated: false }).map((e) => e.href) // ["/check", "/machines", "/trailers", "/ratings", "/preferences"]
 */
export function moreFor(actor: Actor): NavEntry[] {
  return navFor(actor).filter((e) => !e.primary);
}

/** The phone's bottom bar: the primary entries and a "More" page for the rest. */
export function barFor(actor: Actor): NavEntry[] {
  const all = navFor(actor);
  const primary = all.filter((e) => e.primary);
  return primary.length < all.length ? [...primary, { href: "/more", label: "More", icon: "more" }] : primary;
}

"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import type { NavEntry } from "@/lib/shell/nav";
import { NavIcon } from "./nav-icon";

function isActive(pathname: string, href: string) {
  return href === "/" ? pathname === "/" : pathname.startsWith(href);
}

/** Bottom bar on phones, side column on wider screens. */
export function NavLinks({ entries, variant }: { entries: NavEntry[]; variant: "bar" | "side" }) {
  const pathname = usePathname();
  if (variant === "bar") {
    return (
      <ul className="grid" style={{ gridTemplateColumns: `repeat(${entries.length}, minmax(0, 1fr))` }}>
        {entries.map((e) => {
          const active = isActive(pathname, e.href);
          return (
            <li key={e.href}>
              <Link
                href={e.href}
                aria-current={active ? "page" : undefined}
                className={`flex min-h-16 flex-col items-center justify-center gap-0.5 text-sm font-bold ${active ? "bg-signal text-ink" : "text-white"}`}
              >
                <NavIcon icon={e.icon} />
                {e.label}
              </Link>
            </li>
          );
        })}
      </ul>
    );
  }
  return (
    <ul className="flex flex-col gap-1">
      {entries.map((e) => {
        const active = isActive(pathname, e.href);
        return (
          <li key={e.href}>
            <Link
              href={e.href}
              aria-current={active ? "page" : undefined}
              className={`flex min-h-tap items-center gap-3 rounded-lg px-3 text-lg font-bold ${active ? "bg-signal text-ink" : "text-white hover:bg-deck-light"}`}
            >
              <NavIcon icon={e.icon} />
              {e.label}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}

import type { NavIconName } from "@/lib/shell/nav";

const PATHS: Record<NavIconName, string> = {
  home: "M3 11l9-8 9 8v10a1 1 0 0 1-1 1h-5v-7H9v7H4a1 1 0 0 1-1-1z",
  stock: "M4 7h16v4H4zM4 13h16v4H4zM7 9h2M7 15h2",
  people: "M9 11a4 4 0 1 0 0-8 4 4 0 0 0 0 8zM2 21c0-4 3-6 7-6s7 2 7 6M17 11a3 3 0 1 0 0-6M22 21c0-3-2-5-5-5.5",
  settings: "M12 15a3 3 0 1 0 0-6 3 3 0 0 0 0 6zM12 2v3M12 19v3M2 12h3M19 12h3M4.9 4.9l2.1 2.1M17 17l2.1 2.1M4.9 19.1L7 17M17 7l2.1-2.1",
  audit: "M6 3h9l4 4v14H6zM9 10h7M9 14h7M9 18h4",
  records: "M8 4h8v3H8zM6 5H5v16h14V5h-1M8 11h8M8 15h8M8 19h5",
  scan: "M4 8V5a1 1 0 0 1 1-1h3M16 4h3a1 1 0 0 1 1 1v3M20 16v3a1 1 0 0 1-1 1h-3M8 20H5a1 1 0 0 1-1-1v-3M7 12h10",
  kits: "M9 4h6v3H9zM6 6H5a1 1 0 0 0-1 1v13a1 1 0 0 0 1 1h14a1 1 0 0 0 1-1V7a1 1 0 0 0-1-1h-1M8 12l2 2 4-4M8 17h8",
  machines: "M3 17h11v3H3zM5 17v-4h6l2 4M11 13l3-6 5 2-2 5M19 9l2 4-3 1",
  trailers: "M2 15h17l3-3M4 15v2M14 15v2M7 19a2 2 0 1 0 0-4 2 2 0 0 0 0 4zM17 19a2 2 0 1 0 0-4 2 2 0 0 0 0 4zM6 12V9M12 12V9M18 12V9",
  check: "M3 17h18M5 17l2-6h10l2 6M8 11V8h8v3M7 20a1 1 0 1 0 0-2M17 20a1 1 0 1 0 0-2M9 14l2 2 4-4",
  ratings: "M4 20h16M6 20V10M12 20V4M18 20v-7",
  mail: "M3 6h18v12H3zM3 7l9 6 9-6",
  more: "M5 12h.01M12 12h.01M19 12h.01",
};

export function NavIcon({ icon }: { icon: NavIconName }) {
  return (
    <svg viewBox="0 0 24 24" className="h-7 w-7" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" aria-hidden="true">
      <path d={PATHS[icon]} />
    </svg>
  );
}

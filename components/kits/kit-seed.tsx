"use client";
import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import type { KitJson } from "@/lib/kits/answers";
import { kitKey } from "./use-kit";

/**
 * Puts the server's answer for the kit into the page's cache before its sections read it,
 * and again whenever the server renders the page anew (after a load or a return on another
 * screen), so that a kit kept in the cache from an earlier visit never shows an old state.
 */
export function KitSeed({ kit, children }: { kit: KitJson; children: React.ReactNode }) {
  const client = useQueryClient();
  // Remembered across renders as state (React's pattern for "changed since the last render").
  const [seeded, setSeeded] = useState<KitJson | null>(null);
  if (seeded !== kit) {
    setSeeded(kit);
    client.setQueryData(kitKey(kit.id), kit);
  }
  return <>{children}</>;
}

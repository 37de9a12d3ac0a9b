"use client";
import { useQueryClient } from "@tanstack/react-query";
import { useRef } from "react";
import type { KitJson } from "@/lib/kits/answers";
import { kitKey } from "./use-kit";

/**
 * Puts the server's answer for the kit into the page's cache before its sections read it,
 * and again whenever the server renders the page anew (after a load or a return on another
 * screen), so that a kit kept in the cache from an earlier visit never shows an old state.
 */
export function KitSeed({ kit, children }: { kit: KitJson; children: React.ReactNode }) {
  const client = useQueryClient();
  const seeded = useRef<KitJson | null>(null);
  if (seeded.current !== kit) {
    seeded.current = kit;
    client.setQueryData(kitKey(kit.id), kit);
  }
  return <>{children}</>;
}

"use client";
import type { KitJson } from "@/lib/kits/answers";
import { useKit } from "./use-kit";

/** Puts the server's answer for the kit into the page's cache before its sections read it. */
export function KitSeed({ kit, children }: { kit: KitJson; children: React.ReactNode }) {
  useKit(kit.id, kit);
  return <>{children}</>;
}

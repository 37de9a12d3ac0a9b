/**
 * A kit's life: draft → ready → loaded → returned, and ready → draft to edit it again.
 * Who may take each step, what the yard hand's scan must show, and the words written into
 * each item's history.
 *
 * @module
 */
import type { Permission } from "@/lib/auth/roles";
import type { KitState } from "./model";

interface Step {
  readonly permission: Permission;
  /** The verb in the item's history and in messages. */
  readonly words: string;
}

const STEPS: Readonly<Record<KitState, Partial<Record<KitState, Step>>>> = {
  draft: { ready: { permission: "fleet.manage", words: "marked ready" } },
  ready: {
    draft: { permission: "fleet.manage", words: "back to draft for changes" },
    loaded: { permission: "kits.load", words: "loaded" },
  },
  loaded: { returned: { permission: "kits.load", words: "returned" } },
  returned: {},
};

/**
 * Whether a kit can go from one state to another, and the permission that step needs; or
 * the reason it cannot.
 *
 * @example
 * transitionRule("draft", "ready");  // { permission: "fleet.manage", words: "marked ready" }
 * transitionRule("draft", "loaded"); // { error: "A draft kit is marked ready before it is loaded." }
 */
export function transitionRule(from: KitState, to: KitState): Step | { error: string } {
  const step = STEPS[from][to];
  if (step) return step;
  if (from === to) return { error: `The kit is already ${to}.` };
  if (from === "returned") return { error: "The kit has been returned; copy it to plan another trip." };
  if (from === "draft") return { error: "A draft kit is marked ready before it is loaded." };
  if (from === "loaded") return { error: "A loaded kit is returned when it comes back; scan what came back." };
  return { error: "A ready kit is loaded by scanning its items, or goes back to draft for changes." };
}

/**
 * What a scan shows against what the kit holds: items missing from the scan, and items
 * scanned that are not in the kit.
 *
 * @example
 * compareScan(["a", "b", "c"], ["a", "c", "x"]); // { missing: ["b"], unexpected: ["x"] }
 */
export function compareScan(expected: readonly string[], scanned: readonly string[]): { missing: string[]; unexpected: string[] } {
  const want = new Set(expected);
  const got = new Set(scanned);
  return { missing: expected.filter((id) => !got.has(id)), unexpected: scanned.filter((id) => !want.has(id)) };
}

/**
 * The line written into each item's history when its kit takes a step.
 *
 * @example
 * kitEventNote({ job: "Hollins driveway", date: "2026-12-03" }, "loaded"); // "In kit for Hollins driveway, 2026-12-03: loaded"
 */
export function kitEventNote(kit: { job: string; date: string }, to: KitState): string {
  const step = Object.values(STEPS).map((s) => s[to]).find(Boolean);
  return `In kit for ${kit.job}, ${kit.date}: ${step?.words ?? to}`;
}

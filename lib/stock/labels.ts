// Words for item kinds and statuses, the same on every screen, export and tag.

export const ITEM_KINDS = ["chain", "binder", "web-strap", "wire-rope", "hook", "shackle", "rated-item"] as const;
export type ItemKind = (typeof ITEM_KINDS)[number];

export const KIND_LABELS: Record<ItemKind, string> = {
  chain: "Chain",
  binder: "Chain binder",
  "web-strap": "Web strap",
  "wire-rope": "Wire rope",
  hook: "Hook",
  shackle: "Shackle",
  "rated-item": "Other rated item",
};

export const ITEM_STATUSES = ["in_service", "tagged_out", "retired", "lost"] as const;
export type ItemStatus = (typeof ITEM_STATUSES)[number];

/** Status words, and the tone that goes with them (never the colour alone). */
export const STATUS_LABELS: Record<ItemStatus, { label: string; tone: "ok" | "stop" | "idle" | "caution" }> = {
  in_service: { label: "In service", tone: "ok" },
  tagged_out: { label: "Tagged out: do not use", tone: "stop" },
  retired: { label: "Retired: do not use", tone: "idle" },
  lost: { label: "Lost", tone: "caution" },
};

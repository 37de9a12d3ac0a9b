// Builders shared by the check tests (not a test file itself).
import type { Attachment, Component, SecurementCheckRequest, Tiedown } from "@/lib/securement/request";

export const lb = (value: number) => ({ value, unit: "lb" as const });
export const ft = (value: number) => ({ value, unit: "ft" as const });
export const CORNERS = ["front left", "front right", "rear left", "rear right"] as const;

export function chainTiedown(label: string, chain: Omit<Extract<Component, { type: "chain" }>, "type">, extra: { attachment?: Attachment; secures?: string; anchorLb?: number } = {}): Tiedown {
  return {
    label,
    attachment: extra.attachment ?? "direct",
    ...(extra.secures === undefined ? {} : { secures: extra.secures }),
    components: [{ type: "chain", ...chain }, { type: "anchor", wll: lb(extra.anchorLb ?? 20000) }],
  };
}

export function machine(weightLb: number, tiedowns: Tiedown[], cargo: Partial<SecurementCheckRequest["cargo"]> = {}): SecurementCheckRequest {
  return { cargo: { weight: lb(weightLb), length: ft(19), kind: "machine", ...cargo }, tiedowns };
}

export function deepFreeze<T>(value: T): T {
  if (value && typeof value === "object") {
    for (const v of Object.values(value)) deepFreeze(v);
    Object.freeze(value);
  }
  return value;
}

// The plans the securement benchmarks check, shared by the in-process bench (bench/securement.ts)
// and the API bench (bench/api.ts): a large machine held by 12 direct tiedowns (chain, binder,
// hook, anchor), 8 on the machine and one each on its bucket, blade, boom and counterweight.
import type { SecurementCheckRequest, Tiedown } from "../lib/securement/index";

const lb = (value: number) => ({ value, unit: "lb" as const });

export function corner(label: string, secures = "machine"): Tiedown {
  return {
    label,
    attachment: "direct",
    secures,
    components: [
      { type: "chain", grade: 70, size: "3/8 in" },
      { type: "binder", wll: lb(5400), chainSizeRange: ["5/16 in", "3/8 in"] },
      { type: "hook", grade: 70, wll: lb(6600) },
      { type: "anchor", wll: lb(6000) },
    ],
  };
}

export const twelveTiedownPlan: SecurementCheckRequest = {
  cargo: { weight: lb(38000), length: { value: 28, unit: "ft" }, kind: "machine", accessories: ["bucket", "blade"] },
  tiedowns: [
    ...["front left", "front right", "rear left", "rear right", "mid left", "mid right", "front left 2", "rear right 2"].map((l) => corner(l)),
    corner("bucket", "bucket"),
    corner("blade", "blade"),
    corner("boom", "machine"),
    corner("counterweight", "machine"),
  ],
};

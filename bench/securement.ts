// Benchmark of the securement engine: prints timings, asserts nothing.
// Run: npx tsx bench/securement.ts
import { performance } from "node:perf_hooks";
import { checkParsedRequest, checkSecurement, defaultRating, parseSize, securementCheckRequestSchema } from "../lib/securement/index";
import type { SecurementCheckRequest } from "../lib/securement/index";
import { record } from "./lib";
import { corner, twelveTiedownPlan } from "./plans";

const lb = (value: number) => ({ value, unit: "lb" as const });
const TARGET_US = 200; // 0.2 ms a check, in-process

const typical: SecurementCheckRequest = {
  cargo: { weight: lb(18500), length: { value: 22, unit: "ft" }, kind: "machine", accessories: ["bucket", "blade"] },
  tiedowns: [...["front left", "front right", "rear left", "rear right"].map((l) => corner(l)), corner("bucket", "bucket"), corner("blade", "blade")],
};
const large: SecurementCheckRequest = {
  cargo: { weight: { value: 40000, unit: "kg" }, length: { value: 16, unit: "m" }, kind: "general" },
  tiedowns: Array.from({ length: 100 }, (_, i) => corner(`t${i + 1}`)),
};

function bench(name: string, fn: () => unknown, minMs = 1000): number {
  for (let i = 0; i < 200; i++) fn(); // warm-up
  let n = 0;
  const start = performance.now();
  let elapsed = 0;
  while (elapsed < minMs) {
    for (let i = 0; i < 100; i++) fn();
    n += 100;
    elapsed = performance.now() - start;
  }
  const us = (elapsed * 1000) / n;
  console.log(`${name.padEnd(48)} ${us.toFixed(1).padStart(9)} µs/op ${Math.round(n / (elapsed / 1000)).toLocaleString("en-US").padStart(12)} op/s`);
  return us;
}

console.log(`node ${process.version}`);
bench("checkSecurement, 6 tiedowns × 4 parts", () => checkSecurement(typical));
const twelve = bench("checkSecurement, 12 tiedowns × 4 parts", () => checkSecurement(twelveTiedownPlan));
const parsedTwelve = securementCheckRequestSchema.parse(twelveTiedownPlan);
const twelveParsed = bench("  the same, already parsed (as the API does)", () => checkParsedRequest(parsedTwelve));
bench("checkSecurement, 100 tiedowns × 4 parts (kg, m)", () => checkSecurement(large));
bench("defaultRating chain G70 3/8 in", () => defaultRating({ material: "chain", grade: 70, size: "3/8 in" }));
bench("defaultRating steel strapping 31.7 x 0.74 mm", () => defaultRating({ material: "steel-strapping", width: "31.7 mm", thickness: "0.74 mm" }));
bench("parseSize \"1-3/4 in\"", () => parseSize("1-3/4 in"));
if (process.argv.includes("--record")) {
  record([{ what: "securement check, 12 tiedowns, in-process", figure: `${(twelve / 1000).toFixed(3)} ms a check with its validation; ${(twelveParsed / 1000).toFixed(3)} ms already parsed`, target: "< 0.2 ms", baseline: "—", met: twelve < TARGET_US }]);
}

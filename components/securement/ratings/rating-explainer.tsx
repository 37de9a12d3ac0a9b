import Link from "next/link";
import { CHAIN_TABLE, formatNumber } from "@/lib/securement";

const threeEighths = CHAIN_TABLE.rows.find((r) => r.label === "3/8")!;

/** What a table value is, and when a marking governs instead: 49 CFR 393.108 in plain words. */
export function RatingExplainer() {
  return (
    <section aria-labelledby="explain-heading" className="flex flex-col gap-2 rounded-xl border-2 border-ink-soft p-4 text-base">
      <h2 id="explain-heading" className="text-xl font-bold">
        Marked or not: which number counts
      </h2>
      <ul className="flex list-disc flex-col gap-2 pl-5">
        <li>
          <strong>A marking governs.</strong> If the maker marked a WLL on the gear (a tag on the chain, a stamp on the binder, a label sewn
          on the strap), use the marked WLL. The numbers here are for gear with no legible marking. (49 CFR 393.108(b))
        </li>
        <li>
          <strong>Chain without a legible grade mark or tag counts as grade 30 proof coil</strong>, whatever it was bought as: a 3/8 in chain
          drops from {formatNumber(threeEighths.grades[70]!.lb)} lb as grade 70 to {formatNumber(threeEighths.grades[30]!.lb)} lb. (49 CFR 393.108(d))
        </li>
        <li>
          Synthetic rope without a label naming its fibre counts as polypropylene (393.108(c)); wire rope of unknown construction as
          6 × 37 fiber core (393.108(e)).
        </li>
        <li>
          A tiedown is as strong as its weakest part: chain, binder, hook, shackle and the anchor point all count. (393.108(a))
        </li>
        <li>
          Whether a set of tiedowns is enough for a machine (half its weight in aggregate WLL, and the minimum number) is worked out on{" "}
          <Link href="/check" className="font-bold underline">
            Load check
          </Link>
          .
        </li>
      </ul>
    </section>
  );
}

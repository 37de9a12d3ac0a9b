// Prints the table of one `npm run bench`: each figure beside its target and its baseline,
// from what the bench scripts recorded in .data/bench/results.jsonl. Run by bench/run.sh.
import { recordedRows } from "./lib";

const rows = recordedRows();
const head = ["what", "figure", "target", "baseline in the same run", "met"];
const cells = rows.map((r) => [r.what, r.figure, r.target, r.baseline, r.met === null ? "—" : r.met ? "yes" : "NO"]);
console.log(`\n| ${head.join(" | ")} |\n|${head.map(() => "---").join("|")}|`);
for (const c of cells) console.log(`| ${c.join(" | ")} |`);
const missed = rows.filter((r) => r.met === false).length;
console.log(`\n${rows.length} figures, ${rows.length - missed} targets met, ${missed} missed`);

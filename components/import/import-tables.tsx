import type { RowError } from "@/lib/import/row-reader";
import type { PreviewRow } from "@/lib/import/pipeline";
import { toFeet } from "@/lib/securement/units";

const lb = (n: number | null) => (n == null ? "not rated" : `${n.toLocaleString("en-US")} lb`);

/** Every problem of a file by line and column, as the file names them. */
export function ErrorTable({ errors, total }: { errors: RowError[]; total: number }) {
  return (
    <div className="flex flex-col gap-1">
      <div className="max-h-[32rem] overflow-auto rounded-xl border-2 border-stop">
        <table className="w-full border-collapse text-left text-base">
          <caption className="sr-only">Problems by line and column</caption>
          <thead className="sticky top-0 bg-stop-bg">
            <tr className="border-b-2 border-stop">
              <th scope="col" className="px-3 py-2">Line</th>
              <th scope="col" className="px-3 py-2">Column</th>
              <th scope="col" className="px-3 py-2">Problem</th>
            </tr>
          </thead>
          <tbody>
            {errors.map((e, i) => (
              <tr key={i} className="border-b border-idle align-top">
                <td className="px-3 py-2 font-mono font-bold">{e.line}</td>
                <td className="px-3 py-2 font-bold">{e.column ?? "whole row"}</td>
                <td className="px-3 py-2">{e.message}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {total > errors.length && <p className="text-base text-ink-soft">The first {errors.length.toLocaleString("en-US")} of {total.toLocaleString("en-US")} problems are listed.</p>}
    </div>
  );
}

const ACTION_WORDS = { create: "New", update: "Update", unchanged: "No change" } as const;

/** The first rows of a file as they will be stored: the item, its WLL from the rated-limit engine, and what changes. */
export function PreviewTable({ rows }: { rows: PreviewRow[] }) {
  return (
    <div className="overflow-x-auto rounded-xl border-2 border-ink-soft">
      <table className="w-full border-collapse text-left text-base">
        <caption className="sr-only">The first rows as they will be stored</caption>
        <thead>
          <tr className="border-b-2 border-ink">
            <th scope="col" className="px-3 py-2">Line</th>
            <th scope="col" className="px-3 py-2">Becomes</th>
            <th scope="col" className="px-3 py-2">Item</th>
            <th scope="col" className="px-3 py-2">WLL used</th>
            <th scope="col" className="px-3 py-2">Length</th>
            <th scope="col" className="px-3 py-2">Serial</th>
            <th scope="col" className="px-3 py-2">Yard</th>
            <th scope="col" className="px-3 py-2">In service</th>
            <th scope="col" className="px-3 py-2">Cost</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.line} className="border-b border-idle align-top">
              <td className="px-3 py-2 font-mono">{r.line}</td>
              <td className="px-3 py-2">
                <strong>{ACTION_WORDS[r.action]}</strong>
                {r.tagCode && <span className="block font-mono">{r.tagCode}</span>}
                {r.changes && <span className="block text-sm text-ink-soft">changes {Object.keys(r.changes).join(", ")}</span>}
              </td>
              <td className="px-3 py-2">{r.description}{r.markedWllLb != null && <span className="block text-sm text-ink-soft">marked {lb(r.markedWllLb)}</span>}</td>
              <td className="px-3 py-2 font-bold">{lb(r.wllLb)}</td>
              <td className="px-3 py-2">{r.lengthMm != null ? `${Number(toFeet({ value: r.lengthMm, unit: "mm" }).value.toFixed(1))} ft` : ""}</td>
              <td className="px-3 py-2">{r.serial ?? ""}</td>
              <td className="px-3 py-2">{r.yardName ?? ""}</td>
              <td className="px-3 py-2">{r.inServiceOn ?? ""}</td>
              <td className="px-3 py-2">{r.costCents != null ? `$${(r.costCents / 100).toFixed(2)}` : ""}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

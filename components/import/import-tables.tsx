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

const length = (mm: number | null) => (mm != null ? `${Number(toFeet({ value: mm, unit: "mm" }).value.toFixed(1))} ft` : "");
const cost = (cents: number | null) => (cents != null ? `$${(cents / 100).toFixed(2)}` : "");

/** What a row becomes, in words: new (and how many), an update of a tag code, or no change. */
function Becomes({ r }: { r: PreviewRow }) {
  return (
    <>
      <strong>{ACTION_WORDS[r.action]}{r.quantity ? `: ${r.quantity} items` : ""}</strong>
      {r.tagCode && <span className="block whitespace-nowrap font-mono">{r.tagCode}</span>}
      {r.changes && <span className="block text-sm text-ink-soft">changes {Object.keys(r.changes).join(", ")}</span>}
    </>
  );
}

/**
 * The first rows of a file as they will be stored: the item, its WLL from the rated-limit
 * engine, and what changes. A card per row on a phone (nothing cut off), a table on wider screens.
 */
export function PreviewTable({ rows }: { rows: PreviewRow[] }) {
  return (
    <>
      <ul className="flex flex-col gap-2 md:hidden" aria-label="The first rows as they will be stored">
        {rows.map((r) => (
          <li key={r.line} className="flex flex-col gap-1 rounded-xl border-2 border-ink-soft p-3 text-base">
            <p className="flex flex-wrap items-baseline justify-between gap-2">
              <span><Becomes r={r} /></span>
              <span className="text-ink-soft">line {r.line}</span>
            </p>
            <p className="text-lg font-bold">{r.description}</p>
            <p>
              WLL used <strong>{lb(r.wllLb)}</strong>
              {r.markedWllLb != null && <span className="text-ink-soft"> (marked {lb(r.markedWllLb)})</span>}
            </p>
            <dl className="grid grid-cols-[auto_1fr] gap-x-3">
              {(
                [
                  ["Length", length(r.lengthMm)],
                  ["Serial", r.serial ?? ""],
                  ["Yard", r.yardName ?? ""],
                  ["In service", r.inServiceOn ?? ""],
                  ["Cost", cost(r.costCents)],
                ] as const
              )
                .filter(([, v]) => v)
                .map(([k, v]) => (
                  <div key={k} className="contents">
                    <dt className="text-ink-soft">{k}</dt>
                    <dd className="break-words">{v}</dd>
                  </div>
                ))}
            </dl>
          </li>
        ))}
      </ul>
      <PreviewGrid rows={rows} />
    </>
  );
}

function PreviewGrid({ rows }: { rows: PreviewRow[] }) {
  return (
    <div className="hidden overflow-x-auto rounded-xl border-2 border-ink-soft md:block">
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
                <Becomes r={r} />
              </td>
              <td className="px-3 py-2">{r.description}{r.markedWllLb != null && <span className="block text-sm text-ink-soft">marked {lb(r.markedWllLb)}</span>}</td>
              <td className="px-3 py-2 font-bold">{lb(r.wllLb)}</td>
              <td className="whitespace-nowrap px-3 py-2">{length(r.lengthMm)}</td>
              <td className="px-3 py-2">{r.serial ?? ""}</td>
              <td className="px-3 py-2">{r.yardName ?? ""}</td>
              <td className="px-3 py-2">{r.inServiceOn ?? ""}</td>
              <td className="px-3 py-2">{cost(r.costCents)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

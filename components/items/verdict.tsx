import { StatusMark } from "@/components/ui/status-mark";
import { REASON_SHORT, VERDICT_WORDS, type Usability } from "@/lib/stock/usability";

// The one answer to "may I use this?", from lib/stock/usability.ts, as a solid block with
// white words (readable in sunlight, never a pale tint) or as a badge in a list. Nothing
// beside it may say otherwise: no status badge in green above a red verdict.

/** The verdict in full, at the top of the item's page: the answer, every reason, what to do. */
export function VerdictBlock({ usable }: { usable: Usability }) {
  const { ok, reasons, check } = usable;
  return (
    <section aria-labelledby="verdict-answer" className={`flex flex-col gap-2 rounded-xl p-4 text-white ${ok ? "bg-ok" : "bg-stop"}`} data-verdict={ok ? "ok" : "stop"}>
      <p id="verdict-answer" className="flex items-center gap-3 text-3xl font-bold leading-tight">
        <StatusMark ok={ok} className="h-10 w-10 shrink-0" />
        {ok ? VERDICT_WORDS.ok : VERDICT_WORDS.notOk}
      </p>
      {!ok && (
        <>
          <ul className="flex flex-col gap-1 text-lg">
            {reasons.map((r) => (
              <li key={r.code}>{r.message}</li>
            ))}
          </ul>
          <p className="border-t-2 border-white/60 pt-2 text-lg font-bold">{VERDICT_WORDS.setAside}</p>
        </>
      )}
      {ok && check && <p className="text-lg font-bold">{check.message}</p>}
    </section>
  );
}

/** The verdict as a badge in a list or a card: the answer, and the reasons in a word or two. */
export function VerdictBadge({ usable }: { usable: Usability }) {
  const { ok, reasons } = usable;
  return (
    <span className={`inline-flex items-center gap-1.5 rounded-md px-2 py-1 text-base font-bold leading-tight text-white ${ok ? "bg-ok" : "bg-stop"}`}>
      <StatusMark ok={ok} className="h-5 w-5 shrink-0" />
      <span>
        {ok ? VERDICT_WORDS.ok : VERDICT_WORDS.notOk}
        {!ok && reasons.length > 0 && <span className="font-normal">: {reasons.map((r) => REASON_SHORT[r.code]).join(", ")}</span>}
      </span>
    </span>
  );
}

import type { FormAction } from "@/lib/forms/state";
import { changeLines, entryWords } from "@/lib/stock/history-words";
import { formatDateTime } from "@/lib/time";
import { CorrectionForm } from "./item-event-forms";

interface EventRow {
  id: number;
  type: string;
  outcome: string | null;
  checklist: { id: string; label: string; defect: boolean }[] | null;
  measurements: { label: string; value: number; unit: string; limit: string; exceeded: boolean }[] | null;
  note: string | null;
  changes: Record<string, [unknown, unknown]> | null;
  correctsEventId: number | null;
  at: Date;
  actorName: string | null;
  attachments: { id: string; purpose: string; originalName: string }[];
}

/**
 * The service history, newest first, in plain words, with times in the organisation's zone.
 * Entries are never edited; a correction points back to the entry it corrects (the one place
 * an entry's number is shown, so that the two can be matched on paper too).
 */
export function EventList({ itemId, events, correct, timeZone }: { itemId: string; events: EventRow[]; correct: FormAction | null; timeZone: string }) {
  const byId = new Map(events.map((e) => [e.id, e]));
  return (
    <ol className="flex flex-col gap-3">
      {events.map((e) => {
        const { headline, note } = entryWords(e);
        const corrected = e.correctsEventId ? byId.get(e.correctsEventId) : undefined;
        return (
          <li key={e.id} id={`event-${e.id}`} className="rounded-xl border-2 border-idle p-3">
            <p className="text-lg font-bold">{headline}</p>
            <p className="text-base text-ink-soft">
              <time dateTime={new Date(e.at).toISOString()}>{formatDateTime(e.at, timeZone)}</time> · <bdi>{e.actorName ?? "Linkyard"}</bdi>
            </p>
            {e.correctsEventId && (
              <p className="text-base">
                Corrects{" "}
                <a className="inline-flex min-h-tap items-center font-bold underline" href={`#event-${e.correctsEventId}`}>
                  {corrected ? `“${entryWords(corrected).headline}” of ${formatDateTime(corrected.at, timeZone)}` : "an earlier entry"} (entry {e.correctsEventId})
                </a>
              </p>
            )}
            {note && <p className="text-base">{note}</p>}
            {e.checklist?.some((c) => c.defect) && (
              <ul className="list-disc pl-6 text-base text-stop">
                {e.checklist.filter((c) => c.defect).map((c) => <li key={c.id}>{c.label}</li>)}
              </ul>
            )}
            {e.measurements && e.measurements.length > 0 && (
              <ul className="text-base">
                {e.measurements.map((m) => (
                  <li key={m.label}>
                    {m.label}: {m.value} {m.unit === "count" ? "" : m.unit} {m.exceeded ? <strong className="text-stop">past the limit ({m.limit})</strong> : <span>(limit: {m.limit})</span>}
                  </li>
                ))}
              </ul>
            )}
            {e.changes && (
              <ul className="text-base">
                {changeLines(e.changes).map((line) => <li key={line}>{line}</li>)}
              </ul>
            )}
            {e.attachments.length > 0 && (
              <p className="flex flex-wrap gap-3 text-base">
                {e.attachments.map((a) => (
                  <a key={a.id} className="inline-flex min-h-tap items-center font-bold underline" href={`/api/v1/attachments/${a.id}`} target="_blank" rel="noreferrer">
                    {a.purpose === "damage-photo" ? "Photo" : "Document"}: {a.originalName}
                  </a>
                ))}
              </p>
            )}
            {correct && e.type !== "correction" && <CorrectionForm itemId={itemId} eventId={e.id} action={correct} />}
          </li>
        );
      })}
    </ol>
  );
}

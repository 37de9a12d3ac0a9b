import type { FormAction } from "@/lib/forms/state";
import { formatDateTime } from "@/lib/time";
import { CorrectionForm } from "./item-event-forms";

const TYPE_WORDS: Record<string, string> = {
  created: "Added to stock",
  imported: "Imported",
  edited: "Details changed",
  moved: "Moved",
  check: "Pre-use check",
  inspection: "Periodic inspection",
  tag_out: "Tagged out",
  return_to_service: "Returned to service",
  retired: "Retired",
  lost: "Marked lost",
  found: "Marked found",
  correction: "Correction",
};

const OUTCOME_WORDS: Record<string, string> = {
  pass: "no defects",
  fail: "defects found",
  in_service: "keep in service",
  repair: "repair",
  retire: "retire",
};

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

function show(v: unknown) {
  if (v === null || v === undefined || v === "") return "none";
  return typeof v === "object" ? JSON.stringify(v) : String(v);
}

/** The service history, newest first, with times in the organisation's zone. Entries are never edited; a correction points back. */
export function EventList({ itemId, events, correct, timeZone }: { itemId: string; events: EventRow[]; correct: FormAction | null; timeZone: string }) {
  return (
    <ol className="flex flex-col gap-3">
      {events.map((e) => (
        <li key={e.id} id={`event-${e.id}`} className="rounded-xl border-2 border-idle p-3">
          <p className="text-lg font-bold">
            {TYPE_WORDS[e.type] ?? e.type}
            {e.outcome && <span className="font-normal">: {OUTCOME_WORDS[e.outcome] ?? e.outcome}</span>}
          </p>
          <p className="text-base text-ink-soft">
            <time dateTime={new Date(e.at).toISOString()}>{formatDateTime(e.at, timeZone)}</time> · <bdi>{e.actorName ?? "system"}</bdi> · entry #{e.id}
          </p>
          {e.correctsEventId && <p className="text-base">Corrects entry <a className="underline" href={`#event-${e.correctsEventId}`}>#{e.correctsEventId}</a></p>}
          {e.note && <p className="text-base">“{e.note}”</p>}
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
              {Object.entries(e.changes).map(([k, [a, b]]) => (
                <li key={k}>{k}: {show(a)} → {show(b)}</li>
              ))}
            </ul>
          )}
          {e.attachments.length > 0 && (
            <p className="flex flex-wrap gap-3 text-base">
              {e.attachments.map((a) => (
                <a key={a.id} className="font-bold underline" href={`/api/v1/attachments/${a.id}`} target="_blank" rel="noreferrer">
                  {a.purpose === "damage-photo" ? "Photo" : "Document"}: {a.originalName}
                </a>
              ))}
            </p>
          )}
          {correct && e.type !== "correction" && <CorrectionForm itemId={itemId} eventId={e.id} action={correct} />}
        </li>
      ))}
    </ol>
  );
}

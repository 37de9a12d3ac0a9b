"use client";
import { useId } from "react";
import { ChoiceGroup } from "@/components/ui/choice-group";
import { Field, SelectField } from "@/components/ui/field";
import type { FieldIssue } from "@/lib/field-issues";
import { ATTACHMENTS, type Attachment } from "@/lib/securement";
import {
  ADDABLE_PARTS,
  ATTACHMENT_LABELS,
  COMPONENT_LABELS,
  FIBRE_LABELS,
  issueAt,
  newComponent,
  readNumber,
  type ComponentDraft,
  type DraftWeightUnit,
  type TiedownDraft,
} from "@/lib/forms/securement-draft";
import { ComponentEditor } from "./component-editor";

const ATTACHMENT_OPTIONS = ATTACHMENTS.map((a) => ({ value: a, label: ATTACHMENT_LABELS[a].label, sub: ATTACHMENT_LABELS[a].counts }));
/** How many copies "add more like this one" makes: the other three corners. */
const COPIES = 3;

/** What a tiedown is made of, part by part: ["3/8 in G70 chain", "binder 5,400 lb", "D-ring 6,000 lb"]. */
export function partsSummary(t: TiedownDraft, unit: DraftWeightUnit): string[] {
  const wll = (text: string) => {
    const n = readNumber(text);
    if (n === undefined) return "";
    return ` ${n === null ? text.trim() : n.toLocaleString("en-US")} ${unit}`;
  };
  return t.components
    .map((c) => {
      switch (c.type) {
        case "chain":
          return `${c.size} ${c.grade ? `G${c.grade}` : "unmarked"} chain${wll(c.wll)}`;
        case "webbing":
          return `${c.width} strap${wll(c.wll)}`;
        case "wire-rope":
          return `${c.size} wire rope${wll(c.wll)}`;
        case "rope":
          return `${c.size} ${c.fibre ? FIBRE_LABELS[c.fibre].toLowerCase() : "fibre"} rope${wll(c.wll)}`;
        case "steel-strapping":
          return `${c.width} × ${c.thickness} steel strapping${wll(c.wll)}`;
        case "anchor":
          return `${c.label.trim() || "anchor"}${wll(c.wll)}`;
        default:
          return `${COMPONENT_LABELS[c.type].toLowerCase()}${wll(c.wll)}`;
      }
    });
}

/** Parts separated by dots; a line breaks between parts, never inside one ("D-ring"). */
function SummaryParts({ parts }: { parts: readonly string[] }) {
  return (
    <>
      {parts.map((part, i) => (
        <span key={i}>
          <span className="whitespace-nowrap">
            {part}
            {i < parts.length - 1 && " ·"}
          </span>
          {i < parts.length - 1 && " "}
        </span>
      ))}
    </>
  );
}

/** One tiedown: a summary line that opens to its name, what it holds, attachment and parts. */
export function TiedownCard({
  tiedown,
  index,
  unit,
  accessories,
  issues,
  marks,
  open,
  onToggle,
  onChange,
  onRemove,
  onCopy,
}: {
  tiedown: TiedownDraft;
  index: number;
  unit: DraftWeightUnit;
  accessories: readonly string[];
  issues?: readonly FieldIssue[];
  /** What the last check said about this form's fields left empty (see fieldMarks). */
  marks?: readonly FieldIssue[];
  open: boolean;
  onToggle: (open: boolean) => void;
  onChange: (next: TiedownDraft) => void;
  onRemove: () => void;
  /** Adds `count` copies of this tiedown after the last one. */
  onCopy: (count: number) => void;
}) {
  const t = tiedown;
  const id = useId();
  const path = `tiedowns.${index}`;
  const name = `Tiedown ${index + 1}${t.label.trim() ? `: ${t.label.trim()}` : ""}`;
  const hasIssue = issueAt(issues, path) !== undefined;
  const markCount = (marks ?? []).filter((m) => m.path.startsWith(`${path}.`)).length;
  const securesOptions = [
    { value: "machine", label: "The machine" },
    ...accessories.map((a) => ({ value: a, label: `The ${a}` })),
    ...(t.secures !== "machine" && !accessories.includes(t.secures) ? [{ value: t.secures, label: `The ${t.secures} (not ticked above)` }] : []),
  ];
  const setComponent = (i: number, next: ComponentDraft) => onChange({ ...t, components: t.components.map((c, j) => (j === i ? next : c)) });
  return (
    <li>
      <details
        open={open}
        onToggle={(e) => onToggle((e.currentTarget as HTMLDetailsElement).open)}
        className={`rounded-xl border-2 bg-white ${hasIssue ? "border-stop" : "border-ink"}`}
      >
        <summary className="flex min-h-tap cursor-pointer list-none items-center gap-3 p-3 [&::-webkit-details-marker]:hidden">
          <span aria-hidden="true" className="text-2xl font-bold">
            {open ? "−" : "+"}
          </span>
          <span className="flex min-w-0 flex-col">
            <span className="text-lg font-bold">
              {name}
              {t.secures !== "machine" && <span className="font-normal"> · holds the {t.secures}</span>}
            </span>
            <span className="text-base text-ink-soft">
              <SummaryParts parts={[ATTACHMENT_LABELS[t.attachment].label.split(",")[0]!, ...partsSummary(t, unit)]} />
            </span>
            {hasIssue && <span className="text-base font-bold text-stop">✕ Needs fixing</span>}
            {!hasIssue && markCount > 0 && (
              <span className="text-base font-bold text-stop" data-testid={`tiedown-marks-${index}`}>
                ✕ {markCount === 1 ? "1 field to fill in" : `${markCount} fields to fill in`}
              </span>
            )}
          </span>
        </summary>
        <fieldset className="flex flex-col gap-3 border-t-2 border-ink-soft p-3">
          <legend className="sr-only">{name}</legend>
          <div className="grid grid-cols-2 gap-2">
            <Field name={`${path}.label`} label="Name" value={t.label} onChange={(e) => onChange({ ...t, label: e.target.value })} placeholder="front left" autoComplete="off" error={issueAt(issues, `${path}.label`)} />
            <SelectField name={`${path}.secures`} label="Holds" value={t.secures} onChange={(e) => onChange({ ...t, secures: e.target.value })} options={securesOptions} error={issueAt(issues, `${path}.secures`)} />
          </div>
          <ChoiceGroup<Attachment>
            legend="Attachment"
            name={`${id}-attachment`}
            value={t.attachment}
            options={ATTACHMENT_OPTIONS}
            onChange={(attachment) => onChange({ ...t, attachment })}
            columns={1}
            compact
            error={issueAt(issues, `${path}.attachment`)}
          />
          <p className="text-base font-bold">Parts, from the machine to the trailer</p>
          <ul className="flex flex-col gap-2">
            {t.components.map((c, i) => (
              <li key={c.key}>
                <ComponentEditor
                  component={c}
                  index={i}
                  unit={unit}
                  path={`${path}.components.${i}`}
                  issues={issues}
                  marks={marks}
                  onChange={(next) => setComponent(i, next)}
                  onRemove={() => onChange({ ...t, components: t.components.filter((_, j) => j !== i) })}
                  canRemove={t.components.length > 1}
                />
              </li>
            ))}
          </ul>
          {issueAt(issues, `${path}.components`) && !t.components.length && (
            <p className="text-sm font-bold text-stop">✕ {issueAt(issues, `${path}.components`)}</p>
          )}
          <div className="flex flex-col gap-2">
            <p className="text-base font-bold">Add a part</p>
            <div className="grid grid-cols-3 gap-2">
              {ADDABLE_PARTS.map((type) => (
                <button
                  key={type}
                  type="button"
                  onClick={() => onChange({ ...t, components: [...t.components, newComponent(type)] })}
                  aria-label={`Add ${COMPONENT_LABELS[type].toLowerCase()} to tiedown ${index + 1}`}
                  className="inline-flex min-h-tap items-center justify-center rounded-lg border-2 border-ink bg-white px-2 text-base font-bold leading-tight"
                >
                  + {COMPONENT_LABELS[type]}
                </button>
              ))}
            </div>
          </div>
          <button
            type="button"
            onClick={() => onCopy(COPIES)}
            className="inline-flex min-h-tap items-center justify-center rounded-lg border-2 border-ink bg-white px-4 text-lg font-bold"
          >
            + Add {COPIES} more like this one
          </button>
          <button
            type="button"
            onClick={onRemove}
            className="inline-flex min-h-tap items-center justify-center rounded-lg border-2 border-stop bg-white px-4 text-lg font-bold text-stop"
          >
            Remove {name.toLowerCase()}
          </button>
        </fieldset>
      </details>
    </li>
  );
}

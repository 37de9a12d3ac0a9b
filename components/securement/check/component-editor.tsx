"use client";
import type { FieldIssue } from "@/lib/field-issues";
import { GRADE_NAMES, CHAIN_GRADES } from "@/lib/securement";
import {
  CHAIN_SIZES,
  COMPONENT_LABELS,
  issueAt,
  WEBBING_WIDTHS,
  type ComponentDraft,
  type DraftWeightUnit,
} from "@/lib/forms/securement-draft";
import { SelectBox, TextBox } from "./inputs";

const CHAIN_GRADE_OPTIONS = [
  ...CHAIN_GRADES.map((g) => ({ value: String(g), label: `G${g} (${GRADE_NAMES[g].replace(/^grade \d+ /, "")})` })),
  { value: "", label: "No legible mark (counts as G30)" },
];
const FITTING_GRADE_OPTIONS = [{ value: "", label: "Not given" }, ...CHAIN_GRADES.map((g) => ({ value: String(g), label: `G${g}` }))];
const RANGE_OPTIONS = [{ value: "", label: "Not given" }, ...CHAIN_SIZES.map((s) => ({ value: s.value, label: s.value }))];

/** The fields of one part of a tiedown, by its type. `path` is its request path. */
export function ComponentEditor({
  component,
  index,
  unit,
  path,
  issues,
  onChange,
  onRemove,
  canRemove,
}: {
  component: ComponentDraft;
  index: number;
  unit: DraftWeightUnit;
  path: string;
  issues?: readonly FieldIssue[];
  onChange: (next: ComponentDraft) => void;
  onRemove: () => void;
  canRemove: boolean;
}) {
  const c = component;
  const err = (field: string) => issueAt(issues, `${path}.${field}`);
  const patch = (p: Partial<ComponentDraft>) => onChange({ ...c, ...p } as ComponentDraft);
  const title = `Part ${index + 1}: ${COMPONENT_LABELS[c.type]}`;
  const wll = (label: string) => (
    <TextBox label={label} value={c.wll} onChange={(v) => patch({ wll: v })} numeric suffix={unit} error={err("wll")} />
  );
  return (
    <fieldset className="flex flex-col gap-2 rounded-lg border-2 border-ink-soft p-3">
      <legend className="sr-only">{title}</legend>
      <div className="flex items-center justify-between gap-2">
        <p className="text-lg font-bold" aria-hidden="true">
          {title}
        </p>
        {canRemove && (
          <button
            type="button"
            onClick={onRemove}
            aria-label={`Remove part ${index + 1} (${COMPONENT_LABELS[c.type].toLowerCase()})`}
            className="inline-flex min-h-tap items-center rounded-lg border-2 border-ink-soft px-3 text-base font-bold"
          >
            Remove
          </button>
        )}
      </div>
      {c.type === "chain" && (
        <div className="grid grid-cols-2 gap-2">
          <SelectBox className="col-span-2" label="Grade mark" value={c.grade} onChange={(grade) => patch({ grade })} options={CHAIN_GRADE_OPTIONS} error={err("grade")} />
          <SelectBox label="Size" value={c.size} onChange={(size) => patch({ size })} options={CHAIN_SIZES} error={err("size")} />
          {wll("WLL on the tag")}
        </div>
      )}
      {c.type === "webbing" && (
        <div className="grid grid-cols-2 gap-2">
          <SelectBox label="Width" value={c.width} onChange={(width) => patch({ width })} options={WEBBING_WIDTHS} error={err("width")} />
          {wll("WLL on the label")}
        </div>
      )}
      {c.type === "binder" && (
        <div className="grid grid-cols-2 gap-2">
          <div className="col-span-2">{wll("WLL stamped on the binder")}</div>
          <SelectBox label="For chain from" value={c.rangeFrom} onChange={(rangeFrom) => patch({ rangeFrom })} options={RANGE_OPTIONS} error={err("chainSizeRange")} />
          <SelectBox label="to" value={c.rangeTo} onChange={(rangeTo) => patch({ rangeTo })} options={RANGE_OPTIONS} />
        </div>
      )}
      {(c.type === "hook" || c.type === "shackle") && (
        <div className="grid grid-cols-2 gap-2">
          {wll(`WLL stamped on the ${c.type}`)}
          <SelectBox label="Grade" value={c.grade} onChange={(grade) => patch({ grade })} options={FITTING_GRADE_OPTIONS} error={err("grade")} />
        </div>
      )}
      {c.type === "anchor" && (
        <div className="grid grid-cols-2 gap-2">
          <TextBox label="Which one" value={c.label} onChange={(label) => patch({ label })} placeholder="D-ring 3" error={err("label")} />
          {wll("WLL")}
        </div>
      )}
    </fieldset>
  );
}

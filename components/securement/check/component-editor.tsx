"use client";
import { Field, SelectField } from "@/components/ui/field";
import type { FieldIssue } from "@/lib/field-issues";
import { CHAIN_GRADES, GRADE_NAMES, ROPE_FIBRES } from "@/lib/securement";
import {
  CHAIN_SIZES,
  COMPONENT_LABELS,
  FIBRE_LABELS,
  issueAt,
  ROPE_SIZES,
  strappingThicknesses,
  STRAPPING_WIDTHS,
  WEBBING_WIDTHS,
  WIRE_ROPE_SIZES,
  type ComponentDraft,
  type DraftWeightUnit,
} from "@/lib/forms/securement-draft";

const CHAIN_GRADE_OPTIONS = [
  ...CHAIN_GRADES.map((g) => ({ value: String(g), label: `G${g} (${GRADE_NAMES[g].replace(/^grade \d+ /, "")}${g === 43 ? "; also stamped 40" : ""})` })),
  { value: "", label: "No legible mark (counts as G30)" },
];
const FITTING_GRADE_OPTIONS = [{ value: "", label: "Not given" }, ...CHAIN_GRADES.map((g) => ({ value: String(g), label: `G${g}` }))];
const RANGE_OPTIONS = [{ value: "", label: "Not given" }, ...CHAIN_SIZES];
const FIBRE_OPTIONS = (["", ...ROPE_FIBRES] as const).map((f) => ({ value: f, label: FIBRE_LABELS[f] }));

/** The menu's options, plus the current value when it is not one of them (a reopened check's odd size). */
function withCurrent(options: ReadonlyArray<{ value: string; label: string }>, value: string) {
  return value === "" || options.some((o) => o.value === value) ? options : [...options, { value, label: value }];
}

/**
 * The fields of one part of a tiedown, by its type. `path` is its request path; `issues`
 * are the API's refusals and `marks` what the last check said about fields left empty.
 */
export function ComponentEditor({
  component,
  index,
  unit,
  path,
  issues,
  marks,
  onChange,
  onRemove,
  canRemove,
}: {
  component: ComponentDraft;
  index: number;
  unit: DraftWeightUnit;
  path: string;
  issues?: readonly FieldIssue[];
  marks?: readonly FieldIssue[];
  onChange: (next: ComponentDraft) => void;
  onRemove: () => void;
  canRemove: boolean;
}) {
  const c = component;
  const err = (field: string) => issueAt(issues, `${path}.${field}`) ?? issueAt(marks, `${path}.${field}`);
  const patch = (p: Partial<ComponentDraft>) => onChange({ ...c, ...p } as ComponentDraft);
  const title = `Part ${index + 1}: ${COMPONENT_LABELS[c.type]}`;
  const text = (field: string, label: string, value: string, set: (v: string) => void, extra: { numeric?: boolean; placeholder?: string; suffix?: string; className?: string } = {}) => (
    <Field
      name={`${path}.${field}`}
      label={label}
      value={value}
      onChange={(e) => set(e.target.value)}
      inputMode={extra.numeric ? "decimal" : undefined}
      autoComplete="off"
      placeholder={extra.placeholder}
      suffix={extra.suffix}
      className={extra.className}
      error={err(field)}
    />
  );
  const menu = (field: string, label: string, value: string, options: ReadonlyArray<{ value: string; label: string }>, set: (v: string) => void, className?: string) => (
    <SelectField name={`${path}.${field}`} label={label} value={value} onChange={(e) => set(e.target.value)} options={withCurrent(options, value)} className={className} error={err(field)} />
  );
  const wll = (label: string, className?: string) => text("wll", label, c.wll, (v) => patch({ wll: v }), { numeric: true, suffix: unit, className });
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
        <div className="grid grid-cols-2 gap-x-2">
          {menu("grade", "Grade mark", c.grade, CHAIN_GRADE_OPTIONS, (grade) => patch({ grade }), "col-span-2")}
          {menu("size", "Size", c.size, CHAIN_SIZES, (size) => patch({ size }))}
          {wll("WLL on the tag")}
        </div>
      )}
      {c.type === "webbing" && (
        <div className="grid grid-cols-2 gap-x-2">
          {menu("width", "Width", c.width, WEBBING_WIDTHS, (width) => patch({ width }))}
          {wll("WLL on the label")}
        </div>
      )}
      {c.type === "wire-rope" && (
        <div className="grid grid-cols-2 gap-x-2">
          {menu("size", "Diameter", c.size, WIRE_ROPE_SIZES, (size) => patch({ size }))}
          {wll("WLL on the tag")}
          {text("construction", "Construction, if known", c.construction, (construction) => patch({ construction }), { placeholder: "6x19 IWRC", className: "col-span-2" })}
          {text("nominalStrength", "Nominal strength (maker's catalogue)", c.nominalStrength, (nominalStrength) => patch({ nominalStrength }), {
            numeric: true,
            suffix: unit,
            className: "col-span-2",
          })}
          <p className="col-span-2 -mt-1 text-sm text-ink-soft">
            Without a WLL on the tag, a quarter of the nominal strength counts (49 CFR 393.108(e)(1)); without either, the 6 × 37 fiber core table.
          </p>
        </div>
      )}
      {c.type === "rope" && (
        <div className="grid grid-cols-2 gap-x-2">
          {menu("fibre", "Fibre", c.fibre, FIBRE_OPTIONS, (fibre) => patch({ fibre: fibre as typeof c.fibre }), "col-span-2")}
          {menu("size", "Diameter", c.size, ROPE_SIZES, (size) => patch({ size }))}
          {wll("WLL on the label")}
        </div>
      )}
      {c.type === "steel-strapping" && (
        <div className="grid grid-cols-2 gap-x-2">
          {menu("width", "Width", c.width, STRAPPING_WIDTHS, (width) => patch({ width, thickness: strappingThicknesses(width)[0]?.value ?? "" }))}
          {menu("thickness", "Thickness", c.thickness, strappingThicknesses(c.width), (thickness) => patch({ thickness }))}
          {wll("WLL marked", "col-span-2")}
        </div>
      )}
      {c.type === "binder" && (
        <div className="grid grid-cols-2 gap-x-2">
          {wll("WLL stamped on the binder", "col-span-2")}
          {menu("chainSizeRange", "For chain from", c.rangeFrom, RANGE_OPTIONS, (rangeFrom) => patch({ rangeFrom }))}
          <SelectField name={`${path}.chainSizeRange.1`} label="to" value={c.rangeTo} onChange={(e) => patch({ rangeTo: e.target.value })} options={RANGE_OPTIONS} />
        </div>
      )}
      {(c.type === "hook" || c.type === "shackle") && (
        <div className="grid grid-cols-2 gap-x-2">
          {wll(`WLL stamped on the ${c.type}`)}
          {menu("grade", "Grade", c.grade, FITTING_GRADE_OPTIONS, (grade) => patch({ grade }))}
        </div>
      )}
      {c.type === "anchor" && (
        <div className="grid grid-cols-2 gap-x-2">
          {text("label", "Which one", c.label, (label) => patch({ label }), { placeholder: "D-ring 3" })}
          {wll("WLL")}
        </div>
      )}
    </fieldset>
  );
}

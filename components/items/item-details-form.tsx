"use client";
import { useState } from "react";
import { SubmitButton } from "@/components/ui/button";
import { Field, SelectField } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import type { FormAction } from "@/lib/forms/state";
import { useFormAction } from "@/components/ui/use-form-action";
import { ITEM_KINDS, KIND_LABELS, type ItemKind } from "@/lib/stock/labels";

export interface ItemFormValues {
  kind: ItemKind;
  marking: "wll" | "grade" | "none";
  markedWllValue?: string;
  grade?: string;
  size?: string;
  rangeMin?: string;
  rangeMax?: string;
  mechanism?: string;
  lengthValue?: string;
  lengthUnit?: string;
  ends?: string;
  serial?: string;
  yardId?: string;
  inServiceOn?: string;
  cost?: string;
}

const CHAIN_SIZES = ["1/4", "5/16", "3/8", "7/16", "1/2", "5/8"];
const WEB_WIDTHS = ["1 3/4", "2", "3", "4"];

/** Add or edit an item. The fields shown follow the kind; the server validates everything again. */
export function ItemForm({ yards, initial, itemId, action: save }: { yards: { id: string; name: string }[]; initial?: ItemFormValues; itemId?: string; action: FormAction }) {
  const { state, formProps } = useFormAction(save);
  const v = { ...initial, ...state.values } as Partial<ItemFormValues>;
  const [kind, setKind] = useState<ItemKind>((v.kind as ItemKind) ?? "chain");
  const [marking, setMarking] = useState(v.marking ?? "grade");
  const e = state.fieldErrors ?? {};
  const sizes = kind === "web-strap" ? WEB_WIDTHS : CHAIN_SIZES;

  return (
    // One column on a phone; two on a wider screen, what belongs together side by side.
    <form {...formProps} className="grid grid-cols-1 gap-x-6 gap-y-2 md:grid-cols-2">
      {itemId && <input type="hidden" name="itemId" value={itemId} />}
      <div className="md:col-span-2"><FormAlert state={state} /></div>
      {itemId ? (
        <input type="hidden" name="kind" value={kind} />
      ) : (
        <SelectField label="Kind" name="kind" value={kind} onChange={(ev) => setKind(ev.target.value as ItemKind)} options={ITEM_KINDS.map((k) => ({ value: k, label: KIND_LABELS[k] }))} error={e.kind} />
      )}

      <fieldset className="grid grid-cols-1 gap-2 md:col-span-2 md:grid-cols-3" aria-invalid={e.marking ? true : undefined} aria-describedby="marking-error">
        <legend className="text-base font-bold">What is marked on it?</legend>
        {[
          ["wll", "A WLL (working load limit)"],
          ["grade", "A grade only"],
          ["none", "Nothing legible"],
        ].map(([value, label]) => (
          <label
            key={value}
            className="group flex min-h-tap cursor-pointer items-center gap-3 rounded-lg border-2 border-ink-soft px-3 text-lg has-[:checked]:border-deck has-[:checked]:bg-deck has-[:checked]:font-bold has-[:checked]:text-white has-[:focus-visible]:ring-4 has-[:focus-visible]:ring-deck-light"
          >
            <input type="radio" name="marking" value={value} checked={marking === value} onChange={() => setMarking(value as ItemFormValues["marking"])} className="sr-only" />
            <span aria-hidden="true" className="w-5 group-has-[:checked]:before:content-['✓']" />
            {label}
          </label>
        ))}
        <p id="marking-error" aria-live="polite" className="min-h-5 text-sm font-bold text-stop md:col-span-3">{e.marking}</p>
      </fieldset>

      {marking === "wll" && (
        <div className="flex items-end gap-2">
          <Field className="flex-1" label="Marked WLL" name="markedWllValue" inputMode="numeric" defaultValue={v.markedWllValue} error={e.markedWll ?? e["markedWll.value"]} />
          <select name="markedWllUnit" aria-label="WLL unit" defaultValue="lb" className="mb-6 min-h-tap rounded-lg border-2 border-ink-soft px-2 text-lg">
            <option value="lb">lb</option>
            <option value="kg">kg</option>
          </select>
        </div>
      )}
      {(kind === "chain" || kind === "hook") && marking !== "none" && (
        <SelectField label="Grade" name="grade" defaultValue={v.grade ?? "70"} options={[30, 43, 70, 80, 100].map((g) => ({ value: String(g), label: g === 43 ? "Grade 43 (also stamped 40)" : `Grade ${g}` }))} error={e.grade} />
      )}
      {kind === "binder" ? (
        <>
          <SelectField label="Binder" name="mechanism" defaultValue={v.mechanism ?? "ratchet"} options={[{ value: "ratchet", label: "Ratchet" }, { value: "lever", label: "Lever" }]} error={e.mechanism} />
          <div className="grid grid-cols-2 gap-2">
            <Field label="Takes chain from" name="rangeMin" list="sizes" defaultValue={v.rangeMin} placeholder="5/16" error={e.chainSizeRange ?? e["chainSizeRange.0"]} />
            <Field label="to" name="rangeMax" list="sizes" defaultValue={v.rangeMax} placeholder="3/8" error={e["chainSizeRange.1"]} />
          </div>
        </>
      ) : (
        kind !== "rated-item" && (
          <Field
            label={kind === "web-strap" ? "Width (in, or mm)" : "Size (in, or mm)"}
            name="size"
            list="sizes"
            defaultValue={v.size}
            placeholder={kind === "web-strap" ? "2" : "3/8"}
            hint="As the trade writes it: 3/8, 3/8 in, 10 mm or 0.375."
            error={e.size}
          />
        )
      )}
      <datalist id="sizes">{sizes.map((s) => <option key={s} value={s} />)}</datalist>

      <div className="flex items-end gap-2">
        <Field className="flex-1" label="Length (optional)" name="lengthValue" inputMode="decimal" defaultValue={v.lengthValue} error={e.length ?? e["length.value"]} />
        <select name="lengthUnit" aria-label="Length unit" defaultValue={v.lengthUnit ?? "ft"} className="mb-6 min-h-tap rounded-lg border-2 border-ink-soft px-2 text-lg">
          <option value="ft">ft</option>
          <option value="m">m</option>
        </select>
      </div>
      <Field label="End fittings (optional)" name="ends" defaultValue={v.ends} placeholder="grab hook both ends" error={e.ends} />
      <Field label="Serial or lot (optional)" name="serial" defaultValue={v.serial} error={e.serial} />
      <SelectField label="Lives at" name="yardId" defaultValue={v.yardId ?? yards[0]?.id ?? ""} options={[{ value: "", label: "No yard" }, ...yards.map((y) => ({ value: y.id, label: y.name }))]} error={e.yardId} />
      <Field label="In service since (optional)" name="inServiceOn" type="date" defaultValue={v.inServiceOn} error={e.inServiceOn} />
      <Field label="Cost in dollars (optional)" name="cost" inputMode="decimal" defaultValue={v.cost} error={e.costCents} />
      <SubmitButton pendingLabel="Saving…" className="md:col-span-2 md:justify-self-start md:px-10">{itemId ? "Save changes" : "Add to stock"}</SubmitButton>
    </form>
  );
}

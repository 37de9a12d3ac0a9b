"use client";
import { useState } from "react";
import { SaveAlert, useApiSave } from "@/components/ui/api-save";
import { buttonClass } from "@/components/ui/button";
import { Toggle } from "@/components/ui/choice-group";
import { Field, SelectField } from "@/components/ui/field";
import { issueAt } from "@/lib/field-issues";
import type { MachineJson } from "@/lib/kits/answers";
import type { UnitSystem } from "@/lib/kits/display";
import { SIDE_LABELS, SIDES, type Side } from "@/lib/kits/model";
import { draftOf, FleetQuantity, quantityBody, type QuantityDraft } from "./quantity-field";

const COMMON_ACCESSORIES = ["bucket", "blade", "boom and arm", "breaker"];

interface PointDraft {
  key: number;
  label: string;
  side: Side;
  position: QuantityDraft;
}

let nextKey = 0;


/**
 * Add or change a machine. Figures are typed in the organisation's units (or any other);
 * the server stores whole pounds and millimetres and refuses what the securement check
 * would (more than 10 accessories, an accessory called "machine", a name twice).
 */
export function MachineForm({ machine, classes, units }: { machine?: MachineJson; classes: { value: string; label: string }[]; units: UnitSystem }) {
  const [name, setName] = useState(machine?.name ?? "");
  const [machineClass, setClass] = useState(machine?.class ?? classes[0]?.value ?? "other");
  const [weight, setWeight] = useState(draftOf(machine?.weight ?? null, "weight", units));
  const [length, setLength] = useState(draftOf(machine?.length ?? null, "length", units));
  const [width, setWidth] = useState(draftOf(machine?.width ?? null, "length", units));
  const [height, setHeight] = useState(draftOf(machine?.height ?? null, "length", units));
  const [articulated, setArticulated] = useState(machine?.articulated ?? false);
  const [accessories, setAccessories] = useState<string[]>(machine?.accessories ?? []);
  const [points, setPoints] = useState<PointDraft[]>(
    (machine?.tiedownPoints ?? []).map((p) => ({ key: nextKey++, label: p.label, side: p.side, position: draftOf(p.position, "length", units) })),
  );
  const [cg, setCg] = useState(draftOf(machine?.cgFromFront ?? null, "length", units));
  const { problem, issues, busy, save } = useApiSave("Not saved. Try again.");

  function addCorners() {
    const shortUnit = units === "us" ? "in" : "m";
    const near = units === "us" ? "12" : "0.3";
    const corner = (label: string, side: Side, value: string, unit: string) => ({ key: nextKey++, label, side, position: { value, unit } });
    const len = quantityBody(length);
    const far = len ? { value: `${len.value}`, unit: len.unit } : { value: "", unit: shortUnit };
    setPoints((p) => [
      ...p,
      corner("front left", "left", near, shortUnit),
      corner("front right", "right", near, shortUnit),
      corner("rear left", "left", far.value, far.unit),
      corner("rear right", "right", far.value, far.unit),
    ]);
  }

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const body = {
      name,
      class: machineClass,
      weight: quantityBody(weight),
      length: quantityBody(length),
      width: quantityBody(width),
      height: quantityBody(height),
      articulated,
      accessories: accessories.map((a) => a.trim()).filter(Boolean),
      tiedownPoints: points.map((p) => ({ label: p.label, side: p.side, position: quantityBody(p.position) })),
      cgFromFront: quantityBody(cg),
    };
    await save(machine ? `/api/v1/machines/${machine.id}` : "/api/v1/machines", machine ? "PUT" : "POST", body, { to: (id) => `/machines/${id}?saved=1`, refresh: true });
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2">
      <SaveAlert problem={problem} />
      <Field label="Name" name="name" value={name} onChange={(e) => setName(e.target.value)} error={issueAt(issues, "name")} maxLength={80} hint="As the crew says it, e.g. Unit 12 mini excavator" />
      <SelectField label="Class" name="class" value={machineClass} onChange={(e) => setClass(e.target.value)} error={issueAt(issues, "class")} options={classes} />
      <FleetQuantity label="Shipping weight" name="weight" kind="weight" value={weight} onChange={setWeight} error={issueAt(issues, "weight")} hint="With the bucket, blade and anything else that rides on it" />
      <FleetQuantity label="Transport length" name="length" kind="length" value={length} onChange={setLength} error={issueAt(issues, "length")} />
      <div className="grid grid-cols-1 gap-x-3 sm:grid-cols-2">
        <FleetQuantity label="Width (optional)" name="width" kind="length" value={width} onChange={setWidth} error={issueAt(issues, "width")} />
        <FleetQuantity label="Height (optional)" name="height" kind="length" value={height} onChange={setHeight} error={issueAt(issues, "height")} />
      </div>
      <Toggle label="It articulates" hint="Bends in the middle, like a wheel loader" checked={articulated} onChange={setArticulated} />

      <fieldset className="mt-3 flex flex-col gap-2">
        <legend className="text-xl font-bold">Accessories ({accessories.length} of 10)</legend>
        <p className="text-base">Each one that rides on the machine gets its own tiedown (49 CFR 393.130(b)(1)).</p>
        {accessories.map((a, i) => (
          <div key={i} className="flex items-end gap-2">
            <Field className="flex-1" label={`Accessory ${i + 1}`} name={`accessory-${i}`} value={a} maxLength={40} onChange={(e) => setAccessories((list) => list.map((x, j) => (j === i ? e.target.value : x)))} error={issueAt(issues, `accessories.${i}`)} />
            <button type="button" className={buttonClass("secondary", "mb-6 px-3 text-base")} onClick={() => setAccessories((list) => list.filter((_, j) => j !== i))} aria-label={`Remove accessory ${i + 1}`}>
              Remove
            </button>
          </div>
        ))}
        <div className="flex flex-wrap gap-2">
          {COMMON_ACCESSORIES.filter((c) => !accessories.some((a) => a.toLowerCase() === c)).map((c) => (
            <button key={c} type="button" disabled={accessories.length >= 10} className={buttonClass("secondary", "px-3 text-base")} onClick={() => setAccessories((list) => [...list, c])}>
              + {c}
            </button>
          ))}
          <button type="button" disabled={accessories.length >= 10} className={buttonClass("secondary", "px-3 text-base")} onClick={() => setAccessories((list) => [...list, ""])}>
            + another
          </button>
        </div>
      </fieldset>

      <fieldset className="mt-3 flex flex-col gap-2">
        <legend className="text-xl font-bold">Tie-down points ({points.length})</legend>
        <p className="text-base">Where the chains go on the machine, measured back from its front.</p>
        {points.map((p, i) => (
          <div key={p.key} className="flex flex-col gap-1 rounded-lg border-2 border-ink-soft p-2">
            <div className="grid grid-cols-2 gap-2">
              <Field label="Label" name={`point-${p.key}-label`} value={p.label} maxLength={40} onChange={(e) => setPoints((list) => list.map((x) => (x.key === p.key ? { ...x, label: e.target.value } : x)))} error={issueAt(issues, `tiedownPoints.${i}.label`)} />
              <SelectField label="Side" name={`point-${p.key}-side`} value={p.side} onChange={(e) => setPoints((list) => list.map((x) => (x.key === p.key ? { ...x, side: e.target.value as Side } : x)))} options={SIDES.map((s) => ({ value: s, label: SIDE_LABELS[s] }))} />
            </div>
            <FleetQuantity label="From the front" name={`point-${p.key}-position`} kind="length" value={p.position} onChange={(position) => setPoints((list) => list.map((x) => (x.key === p.key ? { ...x, position } : x)))} error={issueAt(issues, `tiedownPoints.${i}.position`)} />
            <button type="button" className={buttonClass("secondary", "px-3 text-base")} onClick={() => setPoints((list) => list.filter((x) => x.key !== p.key))}>
              Remove {p.label || "this point"}
            </button>
          </div>
        ))}
        <div className="flex flex-wrap gap-2">
          {points.length === 0 && (
            <button type="button" className={buttonClass("secondary", "px-3 text-base")} onClick={addCorners}>
              + the four corners
            </button>
          )}
          <button type="button" className={buttonClass("secondary", "px-3 text-base")} onClick={() => setPoints((list) => [...list, { key: nextKey++, label: "", side: "centre", position: { value: "", unit: units === "us" ? "ft" : "m" } }])}>
            + a point
          </button>
        </div>
      </fieldset>

      <div className="mt-3">
        <FleetQuantity
          label="Centre of gravity from the front (optional)"
          name="cgFromFront"
          kind="length"
          value={cg}
          onChange={setCg}
          error={issueAt(issues, "cgFromFront")}
          hint="Leave it empty when unknown: the middle of the machine's length is then assumed, and said so."
        />
      </div>
      <button type="submit" disabled={busy} className={buttonClass("primary", "mt-2 min-h-16 w-full text-xl")}>
        {busy ? "Saving…" : machine ? "Save the machine" : "Add the machine"}
      </button>
    </form>
  );
}

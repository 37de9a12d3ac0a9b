"use client";
import { useState } from "react";
import { SaveAlert, useApiSave } from "@/components/ui/api-save";
import { buttonClass } from "@/components/ui/button";
import { Field, SelectField } from "@/components/ui/field";
import { issueAt } from "@/lib/field-issues";
import type { TrailerJson } from "@/lib/kits/answers";
import type { UnitSystem } from "@/lib/kits/display";
import { COUPLING_LABELS, COUPLINGS, DEFAULT_COUPLING, SIDE_LABELS, SIDES, TRAILER_TYPE_LABELS, TRAILER_TYPES, type Side, type TrailerType } from "@/lib/kits/model";
import { draftOf, FleetQuantity, quantityBody, type QuantityDraft } from "./quantity-field";

interface AnchorDraft {
  key: number;
  id: string | null;
  label: string;
  side: Side;
  position: QuantityDraft;
  wll: QuantityDraft;
  nextInspectionDue: string;
}

let nextKey = 0;


/**
 * Add or change a trailer and its anchor points. Sending the form replaces the list of
 * anchor points: a point removed here is retired (kept on record, never deleted), a new row
 * is a new point. Taking a point out of use is done on the trailer's page, not here.
 */
export function TrailerForm({ trailer, units }: { trailer?: TrailerJson; units: UnitSystem }) {
  const [name, setName] = useState(trailer?.name ?? "");
  const [type, setType] = useState<TrailerType>(trailer?.type ?? "tilt-deck");
  const [coupling, setCoupling] = useState<string>(trailer?.coupling ?? "");
  const q = (k: keyof TrailerJson, kind: "weight" | "length") => draftOf((trailer?.[k] as { value: number } | null) ?? null, kind, units);
  const [deckLength, setDeckLength] = useState(q("deckLength", "length"));
  const [tiltLength, setTiltLength] = useState(q("tiltLength", "length"));
  const [deckWidth, setDeckWidth] = useState(q("deckWidth", "length"));
  const [gvwr, setGvwr] = useState(q("gvwr", "weight"));
  const [emptyWeight, setEmptyWeight] = useState(q("emptyWeight", "weight"));
  const [emptyTongueWeight, setTongue] = useState(q("emptyTongueWeight", "weight"));
  const [hitchToAxle, setHitchToAxle] = useState(q("hitchToAxle", "length"));
  const [hitchToDeckFront, setHitchToDeck] = useState(q("hitchToDeckFront", "length"));
  const [anchors, setAnchors] = useState<AnchorDraft[]>(
    (trailer?.anchorPoints ?? []).map((a) => ({
      key: nextKey++,
      id: a.id,
      label: a.label,
      side: a.side,
      position: draftOf(a.position, "length", units),
      wll: draftOf(a.wll, "weight", units),
      nextInspectionDue: a.nextInspectionDue ?? "",
    })),
  );
  const { problem, issues, busy, save } = useApiSave("Not saved. Try again.");
  const update = (key: number, patch: Partial<AnchorDraft>) => setAnchors((list) => list.map((a) => (a.key === key ? { ...a, ...patch } : a)));

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const body = {
      name,
      type,
      coupling: coupling || null,
      deckLength: quantityBody(deckLength),
      tiltLength: type === "tilt-deck" || type === "split-tilt-deck" ? quantityBody(tiltLength) : null,
      deckWidth: quantityBody(deckWidth),
      gvwr: quantityBody(gvwr),
      emptyWeight: quantityBody(emptyWeight),
      emptyTongueWeight: quantityBody(emptyTongueWeight),
      hitchToAxle: quantityBody(hitchToAxle),
      hitchToDeckFront: quantityBody(hitchToDeckFront),
      anchorPoints: anchors.map((a) => ({
        ...(a.id && { id: a.id }),
        label: a.label,
        side: a.side,
        position: quantityBody(a.position),
        wll: quantityBody(a.wll),
        nextInspectionDue: a.nextInspectionDue || null,
      })),
    };
    await save(trailer ? `/api/v1/trailers/${trailer.id}` : "/api/v1/trailers", trailer ? "PUT" : "POST", body, { to: (id) => `/trailers/${id}?saved=1`, refresh: true });
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2">
      <SaveAlert problem={problem} />
      <Field label="Name" name="name" value={name} onChange={(e) => setName(e.target.value)} error={issueAt(issues, "name")} maxLength={80} />
      <SelectField label="Type" name="type" value={type} onChange={(e) => setType(e.target.value as TrailerType)} options={TRAILER_TYPES.map((t) => ({ value: t, label: TRAILER_TYPE_LABELS[t] }))} error={issueAt(issues, "type")} />
      <SelectField
        label="Coupling"
        name="coupling"
        value={coupling}
        onChange={(e) => setCoupling(e.target.value)}
        options={[{ value: "", label: `Usual for the type (${COUPLING_LABELS[DEFAULT_COUPLING[type]].toLowerCase()})` }, ...COUPLINGS.map((c) => ({ value: c, label: COUPLING_LABELS[c] }))]}
        error={issueAt(issues, "coupling")}
      />
      <FleetQuantity label="Deck length" name="deckLength" kind="length" value={deckLength} onChange={setDeckLength} error={issueAt(issues, "deckLength")} />
      {(type === "tilt-deck" || type === "split-tilt-deck") && (
        <FleetQuantity
          label={type === "tilt-deck" ? "Tilting part (optional: the whole deck)" : "Tilting part at the rear"}
          name="tiltLength"
          kind="length"
          value={tiltLength}
          onChange={setTiltLength}
          error={issueAt(issues, "tiltLength")}
        />
      )}
      <FleetQuantity label="Deck width (optional)" name="deckWidth" kind="length" value={deckWidth} onChange={setDeckWidth} error={issueAt(issues, "deckWidth")} />
      <FleetQuantity label="GVWR" name="gvwr" kind="weight" value={gvwr} onChange={setGvwr} error={issueAt(issues, "gvwr")} hint="From the maker's plate" />
      <FleetQuantity label="Empty weight" name="emptyWeight" kind="weight" value={emptyWeight} onChange={setEmptyWeight} error={issueAt(issues, "emptyWeight")} />
      <FleetQuantity label="Empty tongue weight" name="emptyTongueWeight" kind="weight" value={emptyTongueWeight} onChange={setTongue} error={issueAt(issues, "emptyTongueWeight")} hint="Measured, or from the maker's plate" />
      <FleetQuantity label="Hitch point to the centre of the axles" name="hitchToAxle" kind="length" value={hitchToAxle} onChange={setHitchToAxle} error={issueAt(issues, "hitchToAxle")} />
      <FleetQuantity label="Hitch point to the deck's front (optional)" name="hitchToDeckFront" kind="length" value={hitchToDeckFront} onChange={setHitchToDeck} error={issueAt(issues, "hitchToDeckFront")} />

      <fieldset className="mt-3 flex flex-col gap-2">
        <legend className="text-xl font-bold">Anchor points ({anchors.length})</legend>
        <p className="text-base">D-rings, stake and rub-rail pockets, with the WLL they are rated for, measured back from the deck&apos;s front. Removing one here retires it.</p>
        {issueAt(issues, "anchorPoints") && !issues.some((i) => /^anchorPoints\.\d/.test(i.path)) && <p className="text-base font-bold text-stop">{issueAt(issues, "anchorPoints")}</p>}
        {anchors.map((a, i) => (
          <div key={a.key} className="flex flex-col gap-1 rounded-lg border-2 border-ink-soft p-2">
            <div className="grid grid-cols-2 gap-2">
              <Field label="Label" name={`anchor-${a.key}-label`} value={a.label} maxLength={40} onChange={(e) => update(a.key, { label: e.target.value })} error={issueAt(issues, `anchorPoints.${i}.label`) ?? issueAt(issues, `anchorPoints.${i}.id`)} />
              <SelectField label="Side" name={`anchor-${a.key}-side`} value={a.side} onChange={(e) => update(a.key, { side: e.target.value as Side })} options={SIDES.map((s) => ({ value: s, label: SIDE_LABELS[s] }))} />
            </div>
            <FleetQuantity label="From the deck's front" name={`anchor-${a.key}-position`} kind="length" value={a.position} onChange={(position) => update(a.key, { position })} error={issueAt(issues, `anchorPoints.${i}.position`)} />
            <FleetQuantity label="Rated WLL" name={`anchor-${a.key}-wll`} kind="weight" value={a.wll} onChange={(wll) => update(a.key, { wll })} error={issueAt(issues, `anchorPoints.${i}.wll`)} />
            <Field label="Next inspection due (optional)" name={`anchor-${a.key}-due`} type="date" value={a.nextInspectionDue} onChange={(e) => update(a.key, { nextInspectionDue: e.target.value })} error={issueAt(issues, `anchorPoints.${i}.nextInspectionDue`)} />
            <button type="button" className={buttonClass("secondary", "px-3 text-base")} onClick={() => setAnchors((list) => list.filter((x) => x.key !== a.key))}>
              {a.id ? `Remove ${a.label} (retires it)` : `Remove ${a.label || "this row"}`}
            </button>
          </div>
        ))}
        <button
          type="button"
          className={buttonClass("secondary", "px-3 text-base")}
          onClick={() => setAnchors((list) => [...list, { key: nextKey++, id: null, label: "", side: "left", position: { value: "", unit: units === "us" ? "ft" : "m" }, wll: { value: "", unit: units === "us" ? "lb" : "kg" }, nextInspectionDue: "" }])}
        >
          + an anchor point
        </button>
      </fieldset>
      <button type="submit" disabled={busy} className={buttonClass("primary", "mt-2 min-h-16 w-full text-xl")}>
        {busy ? "Saving…" : trailer ? "Save the trailer" : "Add the trailer"}
      </button>
    </form>
  );
}

"use client";
import { useState } from "react";
import { SaveAlert, useApiSave } from "@/components/ui/api-save";
import { buttonClass } from "@/components/ui/button";
import { Toggle } from "@/components/ui/choice-group";
import { Field, SelectField } from "@/components/ui/field";
import { issueAt } from "@/lib/field-issues";

interface Choice {
  id: string;
  label: string;
  articulated?: boolean;
}

/** A new kit: the date, the job and site, the machine and the trailer. Its tiedowns come next, in the builder. */
export function NewKitForm({ date, machines, trailers }: { date: string; machines: Choice[]; trailers: Choice[] }) {
  const [values, setValues] = useState({ date, job: "", site: "", machineId: machines[0]?.id ?? "", trailerId: trailers[0]?.id ?? "", articulationRestrained: false });
  const { problem, issues, busy, save } = useApiSave("The kit was not saved. Try again.");
  const set = (key: keyof typeof values) => (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement>) => setValues((v) => ({ ...v, [key]: e.target.value }));
  const machine = machines.find((m) => m.id === values.machineId);

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const body = { ...values, site: values.site || null, articulationRestrained: machine?.articulated ? values.articulationRestrained : false };
    await save("/api/v1/kits", "POST", body, { to: (id) => `/kits/${id}` });
  }

  const e = (path: string) => issueAt(issues, path);
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2">
      <SaveAlert problem={problem} />
      <Field label="Date" name="date" type="date" value={values.date} onChange={set("date")} error={e("date")} required />
      <Field label="Job" name="job" value={values.job} onChange={set("job")} error={e("job")} hint="What the crew calls it, e.g. Hollins driveway" maxLength={120} required />
      <Field label="Site (optional)" name="site" value={values.site} onChange={set("site")} error={e("site")} maxLength={200} />
      <SelectField label="Machine" name="machineId" value={values.machineId} onChange={set("machineId")} error={e("machineId")} options={machines.map((m) => ({ value: m.id, label: m.label }))} />
      {machine?.articulated && (
        <Toggle label="Articulation locked for the trip" hint="Lock bar or pin fitted (49 CFR 393.130(b)(2))" checked={values.articulationRestrained} onChange={(checked) => setValues((v) => ({ ...v, articulationRestrained: checked }))} />
      )}
      <SelectField label="Trailer" name="trailerId" value={values.trailerId} onChange={set("trailerId")} error={e("trailerId")} options={trailers.map((t) => ({ value: t.id, label: t.label }))} />
      <button type="submit" disabled={busy} className={buttonClass("primary", "mt-2 min-h-16 w-full text-xl")}>
        {busy ? "Saving…" : "Plan the tiedowns"}
      </button>
    </form>
  );
}

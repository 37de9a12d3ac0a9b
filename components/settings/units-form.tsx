"use client";
import { useState } from "react";
import { SubmitButton } from "@/components/ui/button";
import { ChoiceGroup } from "@/components/ui/choice-group";
import { FormAlert } from "@/components/ui/form-alert";
import type { FormAction } from "@/lib/forms/state";
import { useFormAction } from "@/components/ui/use-form-action";
import { formatLength, formatWeight, UNIT_SYSTEM_LABELS, UNIT_SYSTEMS, type UnitSystem } from "@/lib/kits/display";

/** The units machines, trailers and kits are shown in first; the other system is always beside them. */
export function UnitsForm({ units, action: save }: { units: UnitSystem; action: FormAction }) {
  const { state, formProps } = useFormAction(save);
  const [value, setValue] = useState<UnitSystem>((state.values?.units as UnitSystem) ?? units);
  return (
    <form {...formProps} className="flex flex-col gap-2 rounded-xl border-2 border-ink-soft p-4">
      <h2 className="text-xl font-bold">Units shown</h2>
      <FormAlert state={state} />
      <ChoiceGroup
        legend="Show figures in"
        name="units"
        value={value}
        onChange={setValue}
        options={UNIT_SYSTEMS.map((u) => ({ value: u, label: UNIT_SYSTEM_LABELS[u], sub: `${formatWeight(8100, u)}, ${formatLength(4900, u)}` }))}
        error={state.fieldErrors?.units}
      />
      <SubmitButton pendingLabel="Saving…">Save the units</SubmitButton>
    </form>
  );
}

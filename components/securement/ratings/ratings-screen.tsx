"use client";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { ChoiceGroup } from "@/components/ui/choice-group";
import type { Material } from "@/lib/securement";
import {
  FIBRE_CHOICES,
  GRADE_CHOICES,
  MATERIAL_CHOICES,
  ratingSearch,
  sizeChoices,
  sizeField,
  thicknessChoices,
  type LookupState,
} from "@/lib/forms/rating-lookup";
import { ApiError, fetchRating } from "../api";
import { RatingProblem, RatingResult } from "./rating-result";
import { SizePicker } from "./size-picker";

const START: LookupState = { material: "chain", grade: "70", fibre: "", size: "", thickness: "" };

/** The WLL lookup: material, grade or fibre, size; the answer from GET /api/v1/ratings. */
export function RatingsScreen() {
  const [state, setState] = useState<LookupState>(START);
  const set = (patch: Partial<LookupState>) => setState((s) => ({ ...s, ...patch }));
  const search = ratingSearch(state);
  const query = useQuery({
    queryKey: ["rating", search],
    queryFn: () => fetchRating(search!),
    enabled: search !== null,
    staleTime: Infinity,
    retry: (count, error) => !(error instanceof ApiError && error.status > 0) && count < 1,
  });

  const pickMaterial = (material: Material) => setState({ ...START, material, grade: material === "chain" ? "70" : "" });
  const sizeWord = sizeField(state.material) === "width" ? "Width" : "Size";
  const thicknesses = state.material === "steel-strapping" ? thicknessChoices(state.size) : [];

  return (
    <div className="flex flex-col gap-5">
      <ChoiceGroup legend="Material" name="material" value={state.material} options={MATERIAL_CHOICES} onChange={pickMaterial} columns={2} />

      {state.material === "chain" && (
        <ChoiceGroup
          legend="Grade mark on the links"
          hint="Stamped 7, 70 or 700 means grade 70."
          name="grade"
          value={state.grade}
          options={GRADE_CHOICES}
          onChange={(grade) => set({ grade })}
          columns={3}
        />
      )}
      {state.material === "rope" && (
        <ChoiceGroup legend="Fibre (from the label)" name="fibre" value={state.fibre} options={FIBRE_CHOICES} onChange={(fibre) => set({ fibre })} columns={2} />
      )}

      <SizePicker
        key={state.material}
        legend={state.material === "chain" ? "Chain size" : sizeWord}
        name="size"
        choices={sizeChoices(state.material, state.grade)}
        value={state.size}
        onChange={(size) => set({ size, thickness: "" })}
      />

      {state.material === "steel-strapping" && state.size && (
        thicknesses.length > 0 ? (
          <ChoiceGroup legend="Thickness" name="thickness" value={state.thickness} options={thicknesses} onChange={(thickness) => set({ thickness })} columns={3} />
        ) : (
          <p className="text-lg">The steel strapping table has no thicknesses for this width.</p>
        )
      )}

      <div aria-live="polite" className="flex flex-col gap-3">
        {search === null && (
          <p className="rounded-xl border-2 border-dashed border-ink-soft p-4 text-lg">
            Pick a {state.material === "steel-strapping" && state.size ? "thickness" : sizeWord.toLowerCase()} to see its WLL.
          </p>
        )}
        {search !== null && query.isPending && <p className="p-4 text-lg font-bold">Looking up…</p>}
        {search !== null && query.data && <RatingResult rating={query.data} />}
        {search !== null && query.error instanceof ApiError && <RatingProblem error={query.error} onPick={(size) => set({ size })} />}
      </div>
    </div>
  );
}

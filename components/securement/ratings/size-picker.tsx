"use client";
import { useId, useState } from "react";
import { ChoiceGroup } from "@/components/ui/choice-group";
import type { Choice } from "@/lib/forms/rating-lookup";

/**
 * The table's sizes as big buttons, and a box for a size typed the trade's way
 * (3/8, 3/8 in, 10 mm, 0.375). A tapped button also fills the box, so the two agree.
 */
export function SizePicker({
  legend,
  name,
  choices,
  value,
  onChange,
}: {
  legend: string;
  name: string;
  choices: readonly Choice[];
  value: string;
  onChange: (size: string) => void;
}) {
  const id = useId();
  const [text, setText] = useState(value);
  const [shown, setShown] = useState(value);
  if (shown !== value) {
    // The size changed from outside (a button, a "nearest" suggestion, a new material).
    setShown(value);
    setText(value);
  }
  const columns = choices.length % 3 === 0 || choices.length > 4 ? 3 : 2;
  return (
    <div className="flex flex-col gap-3">
      <ChoiceGroup legend={legend} name={name} value={value} options={choices} onChange={onChange} columns={columns} />
      <form
        className="flex items-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          onChange(text.trim());
        }}
      >
        <div className="flex min-w-0 flex-1 flex-col gap-1">
          <label htmlFor={`${id}-text`} className="text-base font-bold">
            Or type it
          </label>
          <input
            id={`${id}-text`}
            value={text}
            onChange={(e) => setText(e.target.value)}
            placeholder="3/8, 10 mm or 0.375"
            autoComplete="off"
            enterKeyHint="search"
            className="min-h-tap w-full rounded-lg border-2 border-ink-soft bg-white px-3 text-lg placeholder:text-ink-faint"
          />
        </div>
        <button type="submit" className="inline-flex min-h-tap min-w-tap items-center justify-center rounded-lg border-2 border-ink bg-signal px-4 text-lg font-bold text-ink">
          Look up
        </button>
      </form>
    </div>
  );
}

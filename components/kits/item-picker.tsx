"use client";
import { useQuery } from "@tanstack/react-query";
import { useCallback, useState } from "react";
import { buttonClass } from "@/components/ui/button";
import { ChoiceGroup } from "@/components/ui/choice-group";
import { SelectField } from "@/components/ui/field";
import { formatWeight, type UnitSystem } from "@/lib/kits/display";
import type { KitItemJson, KitJson } from "@/lib/kits/answers";
import { KIND_LABELS, type ItemKind } from "@/lib/stock/labels";
import type { ItemJson } from "@/lib/stock/item-json";
import { TagScanner, type ScanNote } from "./tag-scanner";
import { apiJson, ApiError, useKitChange } from "./use-kit";

interface FreeItems {
  date: string;
  data: KitItemJson[];
  suggestions: { itemId: string; reason: string }[];
}

/** The words of a refusal to add an item: the API's own sentence. */
export function refusal(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  return "The change did not go through. Try again.";
}

/**
 * Adds items to a tiedown: by scanning their QR tags with the phone's camera (or typing the
 * code), or from the list of what is free and usable on the kit's date, those that fit first.
 * Every refusal (tagged out, in another kit that day…) is the server's, in its words.
 */
export function ItemPicker({ kit, tiedownId, units, onClose }: { kit: KitJson; tiedownId: string; units: UnitSystem; onClose: () => void }) {
  const [mode, setMode] = useState<"scan" | "list">("scan");
  const add = useKitChange(kit.id, (itemIds: string[]) =>
    apiJson<KitJson>(`/api/v1/kits/${kit.id}/tiedowns/${tiedownId}/items`, { method: "POST", body: JSON.stringify({ itemIds }) }),
  );
  const tiedown = kit.tiedowns.find((t) => t.id === tiedownId);

  const onScanned = useCallback(
    async (item: ItemJson): Promise<ScanNote> => {
      const inKit = kit.tiedowns.find((t) => t.itemIds.includes(item.id));
      if (inKit) return { tone: "info", text: `${item.tagCode} is already in this kit (${inKit.label}).` };
      try {
        await add.mutateAsync([item.id]);
        return { tone: "ok", text: `✓ Added ${item.tagCode}: ${item.description}.` };
      } catch (error) {
        return { tone: "stop", text: `✕ ${refusal(error)}` };
      }
    },
    [add, kit.tiedowns],
  );

  return (
    <section aria-label={`Add items to ${tiedown?.label ?? "the tiedown"}`} className="flex flex-col gap-3 rounded-xl border-2 border-ink bg-white p-3">
      <ChoiceGroup
        legend="Add items"
        name={`pick-${tiedownId}`}
        value={mode}
        onChange={setMode}
        options={[
          { value: "scan", label: "Scan tags" },
          { value: "list", label: "From the list" },
        ]}
      />
      {mode === "scan" ? <TagScanner onItem={onScanned} submitLabel="Add this item" /> : <FreeList kit={kit} tiedownId={tiedownId} units={units} add={add} />}
      <button type="button" onClick={onClose} className={buttonClass("secondary", "w-full")}>
        Done adding items
      </button>
    </section>
  );
}

function FreeList({ kit, tiedownId, units, add }: { kit: KitJson; tiedownId: string; units: UnitSystem; add: ReturnType<typeof useKitChange<string[]>> }) {
  const [kind, setKind] = useState("");
  const [message, setMessage] = useState<ScanNote>(null);
  const itemCount = kit.tiedowns.find((t) => t.id === tiedownId)?.itemIds.length ?? 0;
  const free = useQuery({
    // The tiedown's items are in the key: what fits changes with each item added.
    queryKey: ["free-items", kit.id, tiedownId, itemCount],
    queryFn: () => apiJson<FreeItems>(`/api/v1/kits/${kit.id}/free-items?forTiedownId=${tiedownId}`),
  });
  if (free.isPending) return <p className="text-lg">Looking for free items on {kit.date}…</p>;
  if (free.isError) return <p className="text-lg font-bold text-stop">{refusal(free.error)}</p>;
  const reasons = new Map(free.data.suggestions.map((s) => [s.itemId, s.reason]));
  const suggested = free.data.suggestions.map((s) => free.data.data.find((i) => i.id === s.itemId)!).filter(Boolean);
  const kinds = [...new Set(free.data.data.map((i) => i.kind))];
  const rest = free.data.data.filter((i) => !reasons.has(i.id) && (!kind || i.kind === kind)).slice(0, 40);

  async function pick(item: KitItemJson) {
    try {
      await add.mutateAsync([item.id]);
      setMessage({ tone: "ok", text: `✓ Added ${item.tagCode}: ${item.description}.` });
    } catch (error) {
      setMessage({ tone: "stop", text: `✕ ${refusal(error)}` });
    }
  }

  const row = (item: KitItemJson) => (
    <li key={item.id}>
      <button type="button" onClick={() => void pick(item)} disabled={add.isPending} className="flex min-h-tap w-full flex-col items-start rounded-lg border-2 border-ink-soft bg-white px-3 py-2 text-left hover:border-ink">
        <span className="text-lg font-bold">
          <span className="font-mono">{item.tagCode}</span> · {item.description}
        </span>
        <span className="text-base">
          WLL {item.wllLb == null ? "none" : formatWeight(item.wllLb, units)}
          {reasons.get(item.id) && <span className="font-bold text-ok"> · ✓ {reasons.get(item.id)}</span>}
        </span>
      </button>
    </li>
  );

  return (
    <div className="flex flex-col gap-3">
      <p role="status" aria-live="polite" className={`rounded-lg border-2 p-2 text-lg font-bold ${message ? (message.tone === "ok" ? "border-ok bg-ok-bg" : "border-stop bg-stop-bg text-stop") : "hidden"}`}>
        {message?.text}
      </p>
      {suggested.length > 0 && (
        <section aria-labelledby={`fits-${tiedownId}`} className="flex flex-col gap-2">
          <h4 id={`fits-${tiedownId}`} className="text-lg font-bold">Free items that fit this tiedown</h4>
          <ul className="flex flex-col gap-2">{suggested.slice(0, 8).map(row)}</ul>
        </section>
      )}
      <section aria-labelledby={`all-${tiedownId}`} className="flex flex-col gap-2">
        <h4 id={`all-${tiedownId}`} className="text-lg font-bold">Everything free and usable on {kit.date}</h4>
        <SelectField
          label="Kind"
          name={`kind-${tiedownId}`}
          value={kind}
          onChange={(e) => setKind(e.target.value)}
          options={[{ value: "", label: "Every kind" }, ...kinds.map((k) => ({ value: k, label: KIND_LABELS[k as ItemKind] ?? k }))]}
        />
        {rest.length === 0 ? <p className="text-lg">Nothing else free that day.</p> : <ul className="flex flex-col gap-2">{rest.map(row)}</ul>}
      </section>
    </div>
  );
}

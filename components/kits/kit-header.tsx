"use client";
import { Toggle } from "@/components/ui/choice-group";
import { dayLabel } from "@/lib/time";
import { formatLength, formatWeight, type UnitSystem } from "@/lib/kits/display";
import type { KitJson } from "@/lib/kits/answers";
import { refusal } from "./item-picker";
import { KitPassBadge, KitStateBadge } from "./state-badge";
import { apiJson, useKit, useKitChange } from "./use-kit";

/** What the kit is for: the job and date, the machine and the trailer, its state and verdict. */
export function KitHeader({ kitId, units, today, canEdit }: { kitId: string; units: UnitSystem; today: string; canEdit: boolean }) {
  const { data: kit } = useKit(kitId);
  const patch = useKitChange(kitId, (body: Record<string, unknown>) => apiJson<KitJson>(`/api/v1/kits/${kitId}`, { method: "PATCH", body: JSON.stringify(body) }));
  if (!kit) return null;
  const m = kit.machine;
  const t = kit.trailer;
  const inUse = t.anchorPoints.filter((a) => a.usable.ok).length;
  return (
    <header className="flex flex-col gap-2">
      <p className="text-lg font-bold text-ink-soft">{dayLabel(kit.date, today)}</p>
      <h1 className="text-3xl font-bold leading-tight">{kit.job}</h1>
      {kit.site && <p className="text-lg">{kit.site}</p>}
      <div className="flex flex-wrap gap-2">
        <KitStateBadge state={kit.state} />
        <KitPassBadge pass={kit.pass} />
      </div>
      <dl className="grid grid-cols-1 gap-2 sm:grid-cols-2">
        <div className="rounded-lg border-2 border-ink-soft p-2">
          <dt className="text-sm font-bold text-ink-soft">Machine</dt>
          <dd className="text-lg font-bold">{m.name}</dd>
          <dd className="text-base">
            {m.classLabel} · {formatWeight(m.weight.value, units)} · {formatLength(m.length.value, units)} long
            {m.accessories.length > 0 && ` · with ${m.accessories.join(", ")}`}
            {m.articulated && " · articulated"}
          </dd>
        </div>
        <div className="rounded-lg border-2 border-ink-soft p-2">
          <dt className="text-sm font-bold text-ink-soft">Trailer</dt>
          <dd className="text-lg font-bold">{t.name}</dd>
          <dd className="text-base">
            {t.typeLabel} · deck {formatLength(t.deckLength.value, units)} · {inUse} of {t.anchorPoints.length} anchor points in use
          </dd>
        </div>
      </dl>
      {m.articulated && (
        <div className="flex flex-col gap-1">
          {canEdit && kit.state === "draft" ? (
            <Toggle
              label="Articulation locked for the trip"
              hint="Lock bar or pin fitted (49 CFR 393.130(b)(2))"
              checked={kit.articulationRestrained}
              onChange={(checked) => patch.mutate({ articulationRestrained: checked })}
            />
          ) : (
            <p className="text-lg">Articulation: {kit.articulationRestrained ? "locked for the trip" : "not recorded as locked"}.</p>
          )}
          {patch.isError && <p role="alert" className="text-lg font-bold text-stop">{refusal(patch.error)}</p>}
        </div>
      )}
    </header>
  );
}

"use client";
import { formatLength, formatWeight, type UnitSystem } from "@/lib/kits/display";
import { SIDE_LABELS } from "@/lib/kits/model";
import { UsableBadge } from "./state-badge";
import { useKit } from "./use-kit";

/**
 * The trailer's anchor points on the builder, front to back: each one's side, position, WLL,
 * standing on the kit's date (with the reason when out of use) and the tiedowns that use it.
 * Each card is the target of its mark in the deck picture (`#anchor-<id>`) and is outlined
 * when opened from there.
 */
export function AnchorList({ kitId, units }: { kitId: string; units: UnitSystem }) {
  const { data: kit } = useKit(kitId);
  if (!kit) return null;
  const anchors = kit.trailer.anchorPoints;
  return (
    <section aria-labelledby="anchors-heading" className="flex flex-col gap-3">
      <h2 id="anchors-heading" className="text-2xl font-bold">
        Anchor points on {kit.trailer.name} ({anchors.length})
      </h2>
      <ul className="grid grid-cols-1 gap-2 sm:grid-cols-2">
        {anchors.map((a) => {
          const users = kit.tiedowns.filter((t) => t.anchorPointId === a.id);
          return (
            <li
              key={a.id}
              id={`anchor-${a.id}`}
              tabIndex={-1}
              className={`flex scroll-mt-20 flex-col gap-1 rounded-xl border-2 p-3 text-lg target:outline target:outline-4 target:outline-offset-2 target:outline-[#1d4ed8] ${a.usable.ok ? "border-ink-soft" : "border-stop bg-stop-bg"}`}
              data-testid="anchor-card"
              data-label={a.label}
            >
              <p className="flex flex-wrap items-center gap-2">
                <span className="text-xl font-bold">Anchor point {a.label}</span>
                <UsableBadge ok={a.usable.ok} label={a.usable.ok ? "In use" : "Out of use"} />
              </p>
              <p>
                {SIDE_LABELS[a.side]} side · {formatLength(a.position.value, units)} from the deck&apos;s front · WLL {formatWeight(a.wll.value, units)}
              </p>
              {!a.usable.ok && <p className="text-base font-bold text-stop">{a.usable.reasons.map((r) => r.message).join(" ")}</p>}
              {users.length === 0 ? (
                <p className="text-base text-ink-soft">No tiedown of this kit uses it.</p>
              ) : (
                <p className="text-base">
                  Used by{" "}
                  {users.map((t, i) => (
                    <span key={t.id}>
                      {i > 0 && ", "}
                      <a href={`#tiedown-${t.id}`} className="inline-flex min-h-tap items-center font-bold underline">
                        {kit.tiedowns.indexOf(t) + 1}. {t.label}
                      </a>
                    </span>
                  ))}
                </p>
              )}
            </li>
          );
        })}
      </ul>
    </section>
  );
}

import Link from "next/link";
import { buttonClass } from "@/components/ui/button-class";
import type { KitListEntry } from "@/lib/kits/answers";
import { CopyKitForm } from "./kit-actions";
import { KitPassBadge, KitStateBadge } from "./state-badge";

function plural(n: number, word: string) {
  return `${n} ${word}${n === 1 ? "" : "s"}`;
}

/** One kit in the list: job, machine on trailer, state and verdict in words, and what to do next. */
export function KitCard({ kit, canEdit, canLoad, copyTo }: { kit: KitListEntry; canEdit: boolean; canLoad: boolean; copyTo: string }) {
  return (
    <li className={`flex flex-col gap-2 rounded-xl border-2 p-3 ${kit.pass || kit.state === "returned" ? "border-ink" : "border-stop"}`} data-testid="kit-card" data-kit-id={kit.id}>
      <Link href={`/kits/${kit.id}`} className="flex flex-col gap-1">
        <span className="text-2xl font-bold leading-tight underline">{kit.job}</span>
        {kit.site && <span className="text-lg">{kit.site}</span>}
        <span className="text-lg">
          {kit.machine.name} on {kit.trailer.name}
        </span>
        <span className="text-base text-ink-soft">
          {plural(kit.tiedownCount, "tiedown")} · {plural(kit.itemCount, "item")}
        </span>
      </Link>
      <div className="flex flex-wrap gap-2">
        <KitStateBadge state={kit.state} />
        {kit.state !== "returned" && <KitPassBadge pass={kit.pass} />}
      </div>
      {!kit.pass && kit.state !== "returned" && (
        <p className="text-base font-bold text-stop">
          {[
            kit.failCount ? plural(kit.failCount, "finding") + " against the rule" : "",
            kit.blockerCount ? plural(kit.blockerCount, "part") + " not usable that day" : "",
            kit.placementFailCount ? "the hitch or the GVWR" : "",
          ]
            .filter(Boolean)
            .join(" · ") || "Not checked yet"}
        </p>
      )}
      {canLoad && kit.state === "ready" && (
        <Link href={`/kits/${kit.id}/load`} className={buttonClass("primary", "w-full")}>
          Load by scanning
        </Link>
      )}
      {canLoad && kit.state === "loaded" && (
        <Link href={`/kits/${kit.id}/load`} className={buttonClass("primary", "w-full")}>
          Return by scanning
        </Link>
      )}
      {canEdit && (
        <details>
          <summary className="flex min-h-tap cursor-pointer items-center text-lg font-bold underline">Copy to another date</summary>
          <CopyKitForm kit={kit} defaultDate={copyTo} />
        </details>
      )}
    </li>
  );
}

import Link from "next/link";
import { buttonClass } from "@/components/ui/button-class";

/** The top of a fleet list (machines, trailers): its title and, for those who may, the way to add one. */
export function FleetListHead({ title, addHref, addLabel, mayAdd }: { title: string; addHref: string; addLabel: string; mayAdd: boolean }) {
  return (
    <div className="flex flex-wrap items-center justify-between gap-3">
      <h1 className="text-3xl font-bold">{title}</h1>
      {mayAdd && (
        <Link href={addHref} className={buttonClass("primary")}>
          {addLabel}
        </Link>
      )}
    </div>
  );
}

/** The top of one machine's or trailer's page: back to the list, its name, and "Saved." after a change. */
export function FleetRecordHead({ backHref, backLabel, name, saved }: { backHref: string; backLabel: string; name: string; saved: boolean }) {
  return (
    <>
      <Link href={backHref} className="flex min-h-tap items-center text-lg font-bold underline">
        ← {backLabel}
      </Link>
      <h1 className="text-3xl font-bold">{name}</h1>
      {saved && (
        <p role="status" className="rounded-lg border-2 border-ok bg-ok-bg p-3 text-lg font-bold text-ok">
          Saved.
        </p>
      )}
    </>
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { LoadScreen } from "@/components/kits/load-screen";
import { dayLabel } from "@/lib/time";
import { requireKitPage } from "@/lib/kits/page-kit";

export const metadata: Metadata = { title: "Load or return a kit" };

/** The yard hand loads a ready kit, or returns a loaded one, by scanning each item. */
export default async function LoadKitPage({ params }: { params: Promise<{ id: string }> }) {
  const { kit, today } = await requireKitPage("kits.load", params);
  return (
    <div className="flex max-w-xl flex-col gap-4">
      <Link href={`/kits/${kit.id}`} className="flex min-h-tap items-center text-lg font-bold underline">
        ← The kit
      </Link>
      <header>
        <p className="text-lg font-bold text-ink-soft">{dayLabel(kit.date, today)}</p>
        <h1 className="text-3xl font-bold leading-tight">
          {kit.state === "loaded" ? "Return" : "Load"}: {kit.job}
        </h1>
        <p className="text-lg">
          {kit.machine.name} on {kit.trailer.name}
        </p>
      </header>
      <LoadScreen kit={kit} />
      <p className="rounded-lg border-2 border-caution bg-caution-bg p-3 text-base text-ink">
        Scanning proves which gear went out and came back. Before the trip the driver still inspects the load and every tiedown; local rules and licensed practice govern.
      </p>
    </div>
  );
}

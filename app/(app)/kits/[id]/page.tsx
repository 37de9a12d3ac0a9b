import type { Metadata } from "next";
import Link from "next/link";
import { KitActions } from "@/components/kits/kit-actions";
import { KitDeckSection } from "@/components/kits/kit-deck-section";
import { KitHeader } from "@/components/kits/kit-header";
import { KitSeed } from "@/components/kits/kit-seed";
import { KitVerdictDetails, KitVerdictSummary } from "@/components/kits/kit-verdict";
import { TiedownList } from "@/components/kits/tiedown-list";
import { can } from "@/lib/auth/roles";
import { requireKitPage } from "@/lib/kits/page-kit";

export const metadata: Metadata = { title: "Kit" };

/**
 * The kit builder: what the kit is for, its live verdict, its tiedowns (built here by
 * planners, in a draft), what comes next, and the check in full. Each section reads the same
 * live kit (components/kits/use-kit.ts), so more sections can be placed between them.
 */
export default async function KitPage({ params }: { params: Promise<{ id: string }> }) {
  const { principal, kit, units, today } = await requireKitPage("fleet.view", params);
  const canEdit = can(principal, "fleet.manage");
  return (
    <div className="flex max-w-3xl flex-col gap-5">
      <Link href="/kits" className="flex min-h-tap items-center text-lg font-bold underline">
        ← All kits
      </Link>
      <KitSeed kit={kit}>
        <KitHeader kitId={kit.id} units={units} today={today} canEdit={canEdit} />
        <KitVerdictSummary kitId={kit.id} units={units} />
        <TiedownList kitId={kit.id} units={units} canEdit={canEdit} />
        <KitDeckSection kitId={kit.id} />
        <KitActions kitId={kit.id} canEdit={canEdit} canLoad={can(principal, "kits.load")} />
        <KitVerdictDetails kitId={kit.id} units={units} />
      </KitSeed>
    </div>
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { AnchorList } from "@/components/kits/anchor-list";
import { KitActions } from "@/components/kits/kit-actions";
import { KitDeckSection } from "@/components/kits/kit-deck-section";
import { KitHeader } from "@/components/kits/kit-header";
import { KitPlacementSection } from "@/components/kits/kit-placement-section";
import { KitSeed } from "@/components/kits/kit-seed";
import { KitVerdictDetails, KitVerdictSummary } from "@/components/kits/kit-verdict";
import { ProposalPanel } from "@/components/kits/proposal-panel";
import { TiedownList } from "@/components/kits/tiedown-list";
import { can } from "@/lib/auth/roles";
import { requireKitPage } from "@/lib/kits/page-kit";

export const metadata: Metadata = { title: "Kit" };

/**
 * The kit builder: what the kit is for, its live verdict, a proposed kit (planners, in a
 * draft), its tiedowns, the kit drawn on its trailer, where the machine sits and what the
 * hitch carries, the trailer's anchor points (targets of the picture's marks), what comes
 * next, and the check in full. Each section reads the same live kit
 * (components/kits/use-kit.ts), so a change in one shows in all.
 */
export default async function KitPage({ params }: { params: Promise<{ id: string }> }) {
  const { principal, kit, units, today } = await requireKitPage("fleet.view", params);
  const canEdit = can(principal, "fleet.manage");
  return (
    <div className="flex max-w-3xl flex-col gap-5">
      <div className="flex flex-wrap items-center justify-between gap-x-4 print:hidden">
        <Link href="/kits" className="flex min-h-tap items-center text-lg font-bold underline">
          ← All kits
        </Link>
        <Link href={`/kits/${kit.id}/sheet`} className="flex min-h-tap items-center text-lg font-bold underline">
          Load sheet for the cab
        </Link>
      </div>
      <KitSeed kit={kit}>
        <KitHeader kitId={kit.id} units={units} today={today} canEdit={canEdit} />
        <KitVerdictSummary kitId={kit.id} units={units} />
        {canEdit && <ProposalPanel kitId={kit.id} units={units} />}
        <TiedownList kitId={kit.id} units={units} canEdit={canEdit} />
        <KitDeckSection kitId={kit.id} />
        <KitPlacementSection kitId={kit.id} units={units} canEdit={canEdit} />
        <AnchorList kitId={kit.id} units={units} />
        <KitActions kitId={kit.id} canEdit={canEdit} canLoad={can(principal, "kits.load")} />
        <KitVerdictDetails kitId={kit.id} units={units} />
      </KitSeed>
    </div>
  );
}

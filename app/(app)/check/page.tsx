import type { Metadata } from "next";
import { CheckScreen } from "@/components/securement/check/check-screen";
import { requirePage } from "@/lib/auth/session";
import { isUuid } from "@/lib/http/ids";
import { principalClock } from "@/lib/organisations/service";

export const metadata: Metadata = { title: "Load check" };

type Search = Record<string, string | string[] | undefined>;

/** The load check; `?saved=<id>` opens a saved check (another organisation's id is simply not found). */
export default async function CheckPage({ searchParams }: { searchParams: Promise<Search> }) {
  const principal = await requirePage("securement.check");
  const { timeZone } = await principalClock(principal);
  const saved = (await searchParams).saved;
  const openId = typeof saved === "string" && isUuid(saved) ? saved : undefined;
  return (
    <div className="flex max-w-2xl flex-col gap-5">
      <header className="flex flex-col gap-1">
        <h1 className="text-3xl font-bold">Load check</h1>
        <p className="text-lg">
          Do these tiedowns meet the published minimums for this machine (49 CFR 393)? Change the example or start empty, then check. Save a check with a name to open or print it later.
        </p>
      </header>
      <CheckScreen openId={openId} timeZone={timeZone} />
    </div>
  );
}

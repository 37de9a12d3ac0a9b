import type { Metadata } from "next";
import { CheckScreen } from "@/components/securement/check/check-screen";
import { requirePage } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Load check" };

export default async function CheckPage() {
  await requirePage("securement.check");
  return (
    <div className="flex max-w-2xl flex-col gap-5">
      <header className="flex flex-col gap-1">
        <h1 className="text-3xl font-bold">Load check</h1>
        <p className="text-lg">
          Do these tiedowns meet the published minimums for this machine (49 CFR 393)? Change the example or start empty, then check.
        </p>
      </header>
      <CheckScreen />
    </div>
  );
}

import type { Metadata } from "next";
import { RatingExplainer } from "@/components/securement/ratings/rating-explainer";
import { RatingsScreen } from "@/components/securement/ratings/ratings-screen";
import { requirePage } from "@/lib/auth/session";

export const metadata: Metadata = { title: "WLL lookup" };

export default async function RatingsPage() {
  await requirePage("securement.check");
  return (
    <div className="flex max-w-xl flex-col gap-5">
      <header className="flex flex-col gap-1">
        <h1 className="text-3xl font-bold">WLL lookup</h1>
        <p className="text-lg">The default working load limit of unmarked chain, straps, rope and strapping (49 CFR 393.108).</p>
      </header>
      <RatingsScreen />
      <RatingExplainer />
    </div>
  );
}

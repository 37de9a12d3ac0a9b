import type { Metadata } from "next";
import { Scanner } from "@/components/scan/scanner";
import { requirePage } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Scan" };

/** Scan a QR tag with the phone's camera, or type its code. */
export default async function ScanPage() {
  await requirePage("stock.view");
  return (
    <div className="flex max-w-xl flex-col gap-4">
      <h1 className="text-3xl font-bold">Scan a tag</h1>
      <Scanner />
    </div>
  );
}

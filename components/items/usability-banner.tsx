import type { ItemStatus } from "@/lib/stock/labels";
import { usability } from "@/lib/stock/status";

/**
 * The answer to "may I use this?", in words and colour, big enough to read at arm's length.
 * `today` is the organisation's date (YYYY-MM-DD).
 */
export function UsabilityBanner({ status, nextInspectionDue, today }: { status: ItemStatus; nextInspectionDue: string | null; today: string }) {
  const { usable, reason } = usability(status, nextInspectionDue, today);
  return (
    <div
      role="status"
      className={`flex items-start gap-3 rounded-xl border-4 p-4 ${usable ? "border-ok bg-ok-bg text-ok" : "border-stop bg-stop-bg text-stop"}`}
    >
      <span aria-hidden="true" className="text-4xl leading-none font-bold">{usable ? "✓" : "✕"}</span>
      <div>
        <p className="text-2xl font-bold">{usable ? "In service" : "Do not use"}</p>
        <p className="text-lg">{reason}</p>
      </div>
    </div>
  );
}

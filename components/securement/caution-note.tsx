import { SECUREMENT_CAUTION } from "@/lib/securement";

/** What a securement check is and is not; shown beside every check and lookup. */
export function CautionNote({ text = SECUREMENT_CAUTION }: { text?: string }) {
  return (
    <aside aria-label="What this check covers" className="rounded-lg border-2 border-caution bg-caution-bg p-3 text-base text-ink">
      <p className="mb-1 font-bold text-caution">What this covers</p>
      <p>{text}</p>
    </aside>
  );
}

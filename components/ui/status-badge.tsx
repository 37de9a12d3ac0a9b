import { STATUS_LABELS, type ItemStatus } from "@/lib/stock/labels";

const TONES = {
  ok: "border-ok bg-ok-bg text-ok",
  stop: "border-stop bg-stop-bg text-stop",
  idle: "border-idle bg-idle-bg text-idle",
  caution: "border-caution bg-caution-bg text-caution",
};

const MARKS = { ok: "✓", stop: "✕", idle: "–", caution: "?" };

export function StatusBadge({ status }: { status: ItemStatus }) {
  const { label, tone } = STATUS_LABELS[status];
  return (
    <span className={`inline-flex items-center gap-1 rounded-md border-2 px-2 py-0.5 text-base font-bold ${TONES[tone]}`}>
      <span aria-hidden="true">{MARKS[tone]}</span>
      {label}
    </span>
  );
}

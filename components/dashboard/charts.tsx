"use client";
import { Bar, BarChart, CartesianGrid, LabelList, Legend, ResponsiveContainer, XAxis, YAxis } from "recharts";
import type { DueWeek, GearCounts, TagOutMonth, TagOutReason } from "@/lib/dashboard/charts";
import { TAG_OUT_REASONS } from "@/lib/dashboard/charts";
import type { ItemStatus } from "@/lib/stock/labels";
import { shortDate } from "@/lib/time";
import tailwind from "@/tailwind.config";

// The dashboard's pictures (recharts). Loaded only by the home page, after it has drawn
// (components/dashboard/dashboard-charts.tsx). Each picture is decoration beside a table of
// its figures (the page's own, for screen readers and for the links): the bars carry their
// numbers and the axes their words, and the tag-out reasons differ by pattern as well as
// colour. No keyboard layer: the table is the way in.

const C = tailwind.theme.extend.colors;
const INK = C.ink.DEFAULT;
const AXIS = { fill: INK, fontSize: 14 };

const STATUS_FILL: Record<ItemStatus, string> = { in_service: C.ok.DEFAULT, tagged_out: C.stop.DEFAULT, retired: C.idle.DEFAULT, lost: C.caution.DEFAULT };

/** In-service items due for inspection, week by week. */
export function DueByWeekChart({ weeks }: { weeks: DueWeek[] }) {
  const data = weeks.map((w, i) => ({ name: i < 2 ? w.label : shortDate(w.from), count: w.count }));
  return (
    <ResponsiveContainer width="100%" height={260}>
      <BarChart data={data} margin={{ top: 24, right: 8, bottom: 8, left: 0 }} accessibilityLayer={false}>
        <CartesianGrid vertical={false} stroke={C.idle.bg} />
        <XAxis dataKey="name" tick={AXIS} interval={0} angle={-40} textAnchor="end" height={64} />
        <YAxis allowDecimals={false} tick={AXIS} width={36} />
        <Bar dataKey="count" name="Inspections due" fill={C.deck.DEFAULT} isAnimationActive={false}>
          <LabelList dataKey="count" position="top" fill={INK} fontSize={14} fontWeight={700} />
        </Bar>
      </BarChart>
    </ResponsiveContainer>
  );
}

/** The stock by status: one bar each, its words on the axis and its number at its end. */
export function GearByStatusChart({ byStatus }: { byStatus: GearCounts["byStatus"] }) {
  const data = byStatus.map((s) => ({ name: s.label, count: s.count, fill: STATUS_FILL[s.status] }));
  return (
    <ResponsiveContainer width="100%" height={200}>
      <BarChart data={data} layout="vertical" margin={{ top: 8, right: 48, bottom: 8, left: 8 }} accessibilityLayer={false}>
        <XAxis type="number" allowDecimals={false} tick={AXIS} />
        <YAxis type="category" dataKey="name" tick={AXIS} width={96} />
        <Bar dataKey="count" name="Items" isAnimationActive={false}>
          <LabelList dataKey="count" position="right" fill={INK} fontSize={14} fontWeight={700} />
        </Bar>
      </BarChart>
    </ResponsiveContainer>
  );
}

const REASON_FILL: Record<TagOutReason, string> = {
  check_failed: C.stop.DEFAULT,
  damage_reported: C.caution.DEFAULT,
  inspection_repair: C.deck.DEFAULT,
  found: C.idle.DEFAULT,
};

/** Solid, stripes, dots and cross-hatch: the reasons differ without colour too. */
function ReasonPatterns() {
  return (
    <defs>
      {TAG_OUT_REASONS.map(({ reason }, i) => (
        <pattern key={reason} id={`tag-out-${reason}`} width="8" height="8" patternUnits="userSpaceOnUse">
          <rect width="8" height="8" fill={i === 0 ? REASON_FILL[reason] : "#fff"} />
          {i === 1 && <path d="M-2 2l4-4M0 8l8-8M6 10l4-4" stroke={REASON_FILL[reason]} strokeWidth="2.5" />}
          {i === 2 && <circle cx="4" cy="4" r="2.2" fill={REASON_FILL[reason]} />}
          {i === 3 && <path d="M0 0l8 8M8 0l-8 8" stroke={REASON_FILL[reason]} strokeWidth="1.8" />}
        </pattern>
      ))}
    </defs>
  );
}

/** Tag-outs by reason, month by month, stacked (the totals are in the table beside it). */
export function TagOutsChart({ months }: { months: TagOutMonth[] }) {
  const data = months.map((m) => ({ name: m.label, ...m.counts }));
  return (
    <ResponsiveContainer width="100%" height={300}>
      <BarChart data={data} margin={{ top: 24, right: 8, bottom: 8, left: 0 }} accessibilityLayer={false}>
        <ReasonPatterns />
        <CartesianGrid vertical={false} stroke={C.idle.bg} />
        <XAxis dataKey="name" tick={AXIS} />
        <YAxis allowDecimals={false} tick={AXIS} width={36} />
        <Legend wrapperStyle={{ color: INK, fontSize: 14 }} itemSorter={null} />
        {TAG_OUT_REASONS.map(({ reason, label }) => (
          <Bar key={reason} dataKey={reason} name={label} stackId="reasons" fill={`url(#tag-out-${reason})`} stroke={REASON_FILL[reason]} strokeWidth={1.5} isAnimationActive={false} />
        ))}
      </BarChart>
    </ResponsiveContainer>
  );
}

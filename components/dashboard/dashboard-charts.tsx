"use client";
import dynamic from "next/dynamic";

// The chart library is fetched only here, after the page has drawn: the scan and item pages
// never carry it, and the home page's figures (its tables) do not wait for it.

const loading = () => <p className="flex h-48 items-center text-lg text-ink-soft">Drawing the chart…</p>;

export const DueByWeekChart = dynamic(() => import("./charts").then((m) => m.DueByWeekChart), { ssr: false, loading });
export const GearByStatusChart = dynamic(() => import("./charts").then((m) => m.GearByStatusChart), { ssr: false, loading });
export const TagOutsChart = dynamic(() => import("./charts").then((m) => m.TagOutsChart), { ssr: false, loading });

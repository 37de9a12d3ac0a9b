import { describe, expect, it } from "vitest";
import { buildDigest, DIGEST_LIST_LIMIT, type DigestItem } from "@/lib/reminders/digest";

const item = (tagCode: string, nextInspectionDue: string | null, yardName: string | null = "Home yard"): DigestItem => ({
  tagCode,
  description: "Chain, grade 70, 3/8 in",
  yardName,
  nextInspectionDue,
});

describe("buildDigest", () => {
  const base = { organisationName: "Corvid Hollow Groundworks", today: "2026-12-09", appUrl: "https://yard.example", overdue: [], dueThisWeek: [], taggedOut: [] };

  it("sends nothing when nothing is overdue, due or tagged out", () => {
    expect(buildDigest(base)).toBeNull();
  });

  it("lists overdue (oldest first, with days overdue), due this week (with the weekday) and tagged out, each with its list link", () => {
    const digest = buildDigest({
      ...base,
      overdue: [item("BBBB-2222", "2026-12-08"), item("AAAA-1111", "2026-11-29", "North lot")],
      dueThisWeek: [item("DDDD-4444", "2026-12-15", null), item("CCCC-3333", "2026-12-09")],
      taggedOut: [item("EEEE-5555", "2027-03-01")],
    })!;
    expect(digest.subject).toBe("Corvid Hollow Groundworks: 2 inspections overdue, 2 inspections due this week, 1 item tagged out (Linkyard digest, Wed 2026-12-09)");
    expect(digest.text.split("\n")).toEqual([
      "Good morning. This is Corvid Hollow Groundworks's gear on Wed 2026-12-09.",
      "",
      "Inspection overdue: may not be used until inspected (2):",
      "- AAAA-1111 Chain, grade 70, 3/8 in (North lot): was due 2026-11-29, 10 days overdue",
      "- BBBB-2222 Chain, grade 70, 3/8 in (Home yard): was due 2026-12-08, 1 day overdue",
      "The list in Linkyard: https://yard.example/stock?due=overdue&status=in_service",
      "",
      "Inspection due in the next 7 days, to Tue 2026-12-15 (2):",
      "- CCCC-3333 Chain, grade 70, 3/8 in (Home yard): due Wed 2026-12-09 (today)",
      "- DDDD-4444 Chain, grade 70, 3/8 in: due Tue 2026-12-15",
      "The list in Linkyard: https://yard.example/stock?due=7d&status=in_service",
      "",
      "Tagged out, waiting for an inspection to return it to service, send it for repair or retire it (1):",
      "- EEEE-5555 Chain, grade 70, 3/8 in (Home yard)",
      "The list in Linkyard: https://yard.example/stock?status=tagged_out",
      "",
      "Dates are on your company's calendar. A list here is no substitute for the pre-use check before each trip.",
    ]);
  });

  it("names only the sections that have items", () => {
    const digest = buildDigest({ ...base, taggedOut: [item("EEEE-5555", null)] })!;
    expect(digest.subject).toBe("Corvid Hollow Groundworks: 1 item tagged out (Linkyard digest, Wed 2026-12-09)");
    expect(digest.text).not.toContain("overdue");
    expect(digest.text).not.toContain("next 7 days");
  });

  it("keeps a long list short and counts the rest", () => {
    const many = Array.from({ length: DIGEST_LIST_LIMIT + 3 }, (_, i) => item(`T${String(i).padStart(3, "0")}-0000`, "2026-12-01"));
    const digest = buildDigest({ ...base, overdue: many })!;
    expect(digest.text.split("\n").filter((l) => l.startsWith("- T"))).toHaveLength(DIGEST_LIST_LIMIT);
    expect(digest.text).toContain("…and 3 more.");
    expect(digest.subject).toContain(`${DIGEST_LIST_LIMIT + 3} inspections overdue`);
  });
});

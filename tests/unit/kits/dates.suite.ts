import { describe, expect, it } from "vitest";
import { addDays, dayIn, dayLabel, daysBetween, isIsoDate } from "@/lib/kits/dates";

describe("kit dates", () => {
  it("knows a real date from a wrong one", () => {
    expect(isIsoDate("2026-12-03")).toBe(true);
    expect(isIsoDate("2028-02-29")).toBe(true);
    expect(isIsoDate("2026-02-29")).toBe(false);
    expect(isIsoDate("2026-13-01")).toBe(false);
    expect(isIsoDate("3/12/2026")).toBe(false);
  });

  it("takes today in the organisation's time zone, not in UTC", () => {
    const evening = new Date("2026-12-03T03:30:00Z"); // 21:30 on the 2nd in Chicago
    expect(dayIn("America/Chicago", evening)).toBe("2026-12-02");
    expect(dayIn("UTC", evening)).toBe("2026-12-03");
    expect(dayIn("Pacific/Auckland", new Date("2026-12-02T12:00:00Z"))).toBe("2026-12-03");
  });

  it("counts days across months and years", () => {
    expect(addDays("2026-12-31", 1)).toBe("2027-01-01");
    expect(addDays("2028-03-01", -1)).toBe("2028-02-29");
    expect(daysBetween("2026-12-01", "2026-12-14")).toBe(13);
    expect(daysBetween("2026-03-07", "2026-03-09")).toBe(2); // across a change of clocks in the US
  });

  it("says the day as a planner does", () => {
    expect(dayLabel("2026-12-03", "2026-12-02")).toBe("Tomorrow, Thu 3 Dec 2026");
    expect(dayLabel("2026-12-02", "2026-12-02")).toBe("Today, Wed 2 Dec 2026");
    expect(dayLabel("2026-12-01", "2026-12-02")).toBe("Yesterday, Tue 1 Dec 2026");
    expect(dayLabel("2026-12-09", "2026-12-02")).toBe("Wed 9 Dec 2026");
  });
});

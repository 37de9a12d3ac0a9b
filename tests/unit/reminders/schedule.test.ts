import { describe, expect, it } from "vitest";
import { dailyRunDue } from "@/lib/reminders/schedule";

describe("dailyRunDue", () => {
  const chicago = { timeZone: "America/Chicago", digestTime: "06:00", lastDay: "2026-12-08", createdAt: new Date("2026-11-01T00:00:00Z") };
  it("is due from the digest time on the organisation's clock, not the server's", () => {
    expect(dailyRunDue(chicago, new Date("2026-12-09T11:59:00Z"))).toBeNull(); // 05:59 in Chicago
    expect(dailyRunDue(chicago, new Date("2026-12-09T12:00:00Z"))).toBe("2026-12-09"); // 06:00
    expect(dailyRunDue(chicago, new Date("2026-12-10T05:00:00Z"))).toBe("2026-12-09"); // 23:00 the same day: caught up
  });
  it("runs a day once", () => {
    expect(dailyRunDue({ ...chicago, lastDay: "2026-12-09" }, new Date("2026-12-09T20:00:00Z"))).toBeNull();
    expect(dailyRunDue({ ...chicago, lastDay: null }, new Date("2026-12-09T20:00:00Z"))).toBe("2026-12-09");
  });
  it("starts the day after the organisation was set up, on its calendar", () => {
    const made = { ...chicago, lastDay: null, createdAt: new Date("2026-12-09T13:00:00Z") }; // 07:00 in Chicago
    expect(dailyRunDue(made, new Date("2026-12-09T20:00:00Z"))).toBeNull();
    expect(dailyRunDue(made, new Date("2026-12-10T12:30:00Z"))).toBe("2026-12-10");
  });
  it("follows each zone's date: Kiritimati is a day ahead of Pago Pago at the same instant", () => {
    const at = new Date("2026-12-09T18:00:00Z");
    const base = { digestTime: "06:00", lastDay: null, createdAt: new Date("2026-01-01T00:00:00Z") };
    expect(dailyRunDue({ ...base, timeZone: "Pacific/Kiritimati" }, at)).toBe("2026-12-10"); // 08:00 on the 10th
    expect(dailyRunDue({ ...base, timeZone: "Pacific/Pago_Pago" }, at)).toBe("2026-12-09"); // 07:00 on the 9th
  });
});

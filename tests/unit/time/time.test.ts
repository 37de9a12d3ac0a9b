import { TZDate } from "@date-fns/tz";
import { format } from "date-fns";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays, addMonths, canonicalTimeZone, clockTimeIn, dayLabel, daysBetween, formatDateTime, formatDay, isIsoDate, isTimeZone, timeZones, todayIn, monthOf, monthWords, shortDate, startOfDayIn, weekday, weekStart, writtenDate } from "@/lib/time";

describe("todayIn", () => {
  it("a US yard (America/Chicago) at 7 pm local on 2026-12-01 sees 2026-12-01, not 12-02", () => {
    const sevenPm = new Date("2026-12-02T01:00:00Z"); // 19:00 CST (UTC-6)
    expect(todayIn("America/Chicago", sevenPm)).toBe("2026-12-01");
    expect(todayIn("UTC", sevenPm)).toBe("2026-12-02");
  });

  it("turns the day at local midnight, on either side of a daylight-saving change", () => {
    expect(todayIn("America/Chicago", new Date("2026-03-08T05:59:00Z"))).toBe("2026-03-07"); // 23:59 CST
    expect(todayIn("America/Chicago", new Date("2026-03-08T06:00:00Z"))).toBe("2026-03-08"); // 00:00 CST
    expect(todayIn("America/Chicago", new Date("2026-11-01T04:59:00Z"))).toBe("2026-10-31"); // 23:59 CDT
    expect(todayIn("America/Chicago", new Date("2026-11-01T05:00:00Z"))).toBe("2026-11-01"); // 00:00 CDT
  });

  it("is ahead of UTC east of Greenwich", () => {
    expect(todayIn("Pacific/Auckland", new Date("2026-12-01T12:00:00Z"))).toBe("2026-12-02");
  });
});

describe("formatDay and formatDateTime", () => {
  it("show an instant on the organisation's wall clock, not UTC's", () => {
    const at = new Date("2026-12-02T01:04:00Z");
    expect(formatDateTime(at, "America/Chicago")).toBe("2026-12-01 19:04");
    expect(formatDay(at, "America/Chicago")).toBe("2026-12-01");
    expect(formatDateTime(at.toISOString(), "America/New_York")).toBe("2026-12-01 20:04");
    expect(formatDateTime(new Date("2026-07-01T12:00:00Z"), "America/Chicago")).toBe("2026-07-01 07:00"); // CDT
  });
});

describe("wall clock of an instant, against @date-fns/tz as the reference", () => {
  // lib/time reads an instant's wall clock through Intl; date-fns with @date-fns/tz (a
  // general-purpose library, tested on its own) must agree to the minute, in zones with
  // daylight saving, half- and quarter-hour offsets and a date-line jump.
  const zones = ["UTC", "America/Chicago", "America/St_Johns", "Europe/London", "Australia/Lord_Howe", "Asia/Kathmandu", "Pacific/Chatham", "Pacific/Apia", "America/Santiago"];
  it("agrees on date, hour and minute at any instant from 1971 to 2099", () => {
    fc.assert(
      fc.property(fc.integer({ min: Date.UTC(1971, 0, 1), max: Date.UTC(2099, 11, 31) }), fc.constantFrom(...zones), (ms, zone) => {
        const reference = format(new TZDate(ms, zone), "yyyy-MM-dd HH:mm");
        expect(formatDateTime(new Date(ms), zone)).toBe(reference);
        expect(formatDay(new Date(ms).toISOString(), zone)).toBe(reference.slice(0, 10));
        expect(todayIn(zone, new Date(ms))).toBe(reference.slice(0, 10));
        expect(clockTimeIn(zone, new Date(ms))).toBe(reference.slice(11));
      }),
      { numRuns: 2000 },
    );
  });

  it("answers each minute anew, the same within a minute and after another zone's question", () => {
    const before = new Date("2026-12-02T05:59:59.999Z"); // 23:59 in Chicago
    const turn = new Date("2026-12-02T06:00:00Z"); // 00:00
    expect(todayIn("America/Chicago", before)).toBe("2026-12-01");
    expect(todayIn("America/Chicago", new Date(before.getTime() - 59_000))).toBe("2026-12-01");
    expect(todayIn("America/Chicago", turn)).toBe("2026-12-02");
    expect(todayIn("UTC", turn)).toBe("2026-12-02");
    expect(todayIn("America/Chicago", before)).toBe("2026-12-01"); // back in time too
    expect(todayIn("Pacific/Auckland", before)).toBe("2026-12-02");
    expect(todayIn("America/Chicago", turn)).toBe("2026-12-02");
  });

  it("reads odd historical offsets (Liberia's −0:44:30 until 1972) to the minute", () => {
    // 12:00:00 − 0:44:30 = 11:15:30; 40 s later it is 11:16:10 (within the same UTC minute).
    expect(formatDateTime(new Date("1971-06-01T12:00:00Z"), "Africa/Monrovia")).toBe("1971-06-01 11:15");
    expect(formatDateTime(new Date("1971-06-01T12:00:40Z"), "Africa/Monrovia")).toBe("1971-06-01 11:16");
  });

  it("midnight is 00:00, never 24:00", () => {
    expect(formatDateTime(new Date("2026-12-02T06:00:00Z"), "America/Chicago")).toBe("2026-12-02 00:00");
  });

  it("refuses an unknown zone and an invalid time, as date-fns does", () => {
    expect(() => todayIn("Mars/Olympus")).toThrow(RangeError);
    expect(() => formatDateTime("not a time", "UTC")).toThrow(RangeError);
  });
});

describe("addDays", () => {
  it("adds calendar days across months, leap days and daylight-saving changes", () => {
    expect(addDays("2026-01-31", 30)).toBe("2026-03-02");
    expect(addDays("2028-02-28", 1)).toBe("2028-02-29");
    expect(addDays("2026-03-07", 1)).toBe("2026-03-08");
    expect(addDays("2026-12-01", 365)).toBe("2027-12-01");
    expect(addDays("2026-12-01", -1)).toBe("2026-11-30");
  });
});

describe("time zone names", () => {
  it("knows the IANA names of Intl's list, and UTC", () => {
    expect(timeZones()[0]).toBe("UTC");
    expect(timeZones()).toContain("America/Chicago");
    expect(isTimeZone("America/Chicago")).toBe(true);
    expect(isTimeZone("UTC")).toBe(true);
  });

  it("refuses a name Intl does not know", () => {
    expect(isTimeZone("Mars/Olympus")).toBe(false);
    expect(isTimeZone("")).toBe(false);
    expect(canonicalTimeZone("not a zone")).toBeNull();
  });

  it("takes an alias under the list's own name", () => {
    const kolkata = canonicalTimeZone("Asia/Kolkata");
    expect(kolkata).not.toBeNull();
    expect(timeZones()).toContain(kolkata);
    expect(canonicalTimeZone("Etc/UTC")).toBe("UTC");
  });
});

describe("daysBetween, weekday and clockTimeIn", () => {
  it("counts calendar days across a month end and a daylight-saving change", () => {
    expect(daysBetween("2026-11-28", "2026-12-03")).toBe(5);
    expect(daysBetween("2026-03-07", "2026-03-09")).toBe(2); // US clocks go forward on the 8th
    expect(daysBetween("2026-12-09", "2026-12-01")).toBe(-8);
  });
  it("names the weekday of a calendar date", () => {
    expect(["2026-12-07", "2026-12-13"].map(weekday)).toEqual(["Mon", "Sun"]);
  });
  it("gives the wall-clock time of an instant in a zone", () => {
    expect(clockTimeIn("America/Chicago", new Date("2026-07-02T13:05:00Z"))).toBe("08:05"); // daylight time
    expect(clockTimeIn("UTC", new Date("2026-07-02T00:00:00Z"))).toBe("00:00");
  });
});

describe("calendar dates (kits are for a date)", () => {
  it("knows a real date from a wrong one", () => {
    expect(isIsoDate("2026-12-03")).toBe(true);
    expect(isIsoDate("2028-02-29")).toBe(true);
    expect(isIsoDate("2026-02-29")).toBe(false);
    expect(isIsoDate("2026-13-01")).toBe(false);
    expect(isIsoDate("3/12/2026")).toBe(false);
  });

  it("adds days across months and years", () => {
    expect(addDays("2026-12-31", 1)).toBe("2027-01-01");
    expect(addDays("2028-03-01", -1)).toBe("2028-02-29");
    expect(daysBetween("2026-12-01", "2026-12-14")).toBe(13);
  });

  it("writes a date out, and says it as a planner does", () => {
    expect(writtenDate("2026-12-03")).toBe("Thu 3 Dec 2026");
    expect(dayLabel("2026-12-03", "2026-12-02")).toBe("Tomorrow, Thu 3 Dec 2026");
    expect(dayLabel("2026-12-02", "2026-12-02")).toBe("Today, Wed 2 Dec 2026");
    expect(dayLabel("2026-12-01", "2026-12-02")).toBe("Yesterday, Tue 1 Dec 2026");
    expect(dayLabel("2026-12-09", "2026-12-02")).toBe("Wed 9 Dec 2026");
  });
});

describe("weeks and months for the dashboard", () => {
  it("weeks start on Monday", () => {
    expect(weekStart("2026-12-03")).toBe("2026-11-30"); // a Thursday
    expect(weekStart("2026-11-30")).toBe("2026-11-30"); // a Monday
    expect(weekStart("2026-12-06")).toBe("2026-11-30"); // a Sunday ends the week
    expect(weekStart("2027-01-01")).toBe("2026-12-28"); // across the year
  });

  it("months add across years and print as words", () => {
    expect(addMonths("2026-02", -3)).toBe("2025-11");
    expect(addMonths("2026-12", 1)).toBe("2027-01");
    expect(monthOf("2026-12-31")).toBe("2026-12");
    expect(monthWords("2026-12")).toBe("Dec 2026");
    expect(shortDate("2026-12-03")).toBe("3 Dec");
  });

  it("a day starts at local midnight, on either side of a daylight-saving change", () => {
    expect(startOfDayIn("2026-12-01", "America/Chicago").toISOString()).toBe("2026-12-01T06:00:00.000Z"); // CST
    expect(startOfDayIn("2026-07-01", "America/Chicago").toISOString()).toBe("2026-07-01T05:00:00.000Z"); // CDT
    expect(startOfDayIn("2026-12-01", "UTC").toISOString()).toBe("2026-12-01T00:00:00.000Z");
    expect(startOfDayIn("2026-12-02", "Pacific/Auckland").toISOString()).toBe("2026-12-01T11:00:00.000Z");
  });
});

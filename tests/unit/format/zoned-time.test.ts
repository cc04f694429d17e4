// Wall-clock times in a show's zone ⇄ UTC, including the daylight-saving edges.
import { describe, expect, it } from "vitest";
import { parseLocalInput, utcToZonedInput, zonedInputToUtc, zoneOffsetMs } from "@/components/format/zoned-time";

const HOUR = 3_600_000;
const CHI = "America/Chicago";

describe("zone offsets (US rules: CST = UTC−6, CDT = UTC−5; from memory, checked against Intl below)", () => {
  it("America/Chicago is UTC−6 in January and UTC−5 in July", () => {
    expect(zoneOffsetMs(new Date("2027-01-15T12:00:00Z"), CHI)).toBe(-6 * HOUR);
    expect(zoneOffsetMs(new Date("2027-07-15T12:00:00Z"), CHI)).toBe(-5 * HOUR);
  });

  it("agrees with Intl's own zone name for those instants", () => {
    const name = (d: string) =>
      new Intl.DateTimeFormat("en-US", { timeZone: CHI, timeZoneName: "short" }).formatToParts(new Date(d)).find((p) => p.type === "timeZoneName")?.value;
    expect(name("2027-01-15T12:00:00Z")).toBe("CST");
    expect(name("2027-07-15T12:00:00Z")).toBe("CDT");
  });

  it("knows zones east of UTC and with half hours (Asia/Kolkata is UTC+5:30, from memory)", () => {
    expect(zoneOffsetMs(new Date("2027-01-15T00:00:00Z"), "Asia/Kolkata")).toBe(5.5 * HOUR);
    expect(zoneOffsetMs(new Date("2027-07-15T00:00:00Z"), "Europe/London")).toBe(1 * HOUR);
    expect(zoneOffsetMs(new Date("2027-01-15T00:00:00Z"), "Europe/London")).toBe(0);
  });
});

describe("zonedInputToUtc / utcToZonedInput", () => {
  it("reads ordinary times with the season's offset", () => {
    expect(zonedInputToUtc("2027-01-15T09:00", CHI)?.toISOString()).toBe("2027-01-15T15:00:00.000Z");
    expect(zonedInputToUtc("2027-07-15T09:00", CHI)?.toISOString()).toBe("2027-07-15T14:00:00.000Z");
    expect(zonedInputToUtc("2027-07-15T09:00", "Asia/Kolkata")?.toISOString()).toBe("2027-07-15T03:30:00.000Z");
  });

  it("round-trips every half hour across a year", () => {
    for (let t = Date.UTC(2027, 0, 1); t < Date.UTC(2028, 0, 1); t += 30 * 60_000 * 7) {
      const local = utcToZonedInput(new Date(t), CHI);
      const back = zonedInputToUtc(local, CHI)!;
      // Only the repeated autumn hour may come back as its earlier twin, one hour before.
      expect([0, HOUR]).toContain(t - back.getTime());
      expect(utcToZonedInput(back, CHI)).toBe(local);
    }
  });

  // US rules since 2007 (from memory): forward at 02:00 on the second Sunday of March, back at
  // 02:00 on the first Sunday of November; in 2027 those are 14 March and 7 November.
  it("a skipped spring time is moved forward by the gap: 02:30 → 03:30 CDT", () => {
    expect(zonedInputToUtc("2027-03-14T02:30", CHI)?.toISOString()).toBe("2027-03-14T08:30:00.000Z");
    expect(utcToZonedInput(new Date("2027-03-14T08:30:00Z"), CHI)).toBe("2027-03-14T03:30");
    expect(zonedInputToUtc("2027-03-14T01:59", CHI)?.toISOString()).toBe("2027-03-14T07:59:00.000Z");
    expect(zonedInputToUtc("2027-03-14T03:00", CHI)?.toISOString()).toBe("2027-03-14T08:00:00.000Z");
  });

  it("a repeated autumn time is the earlier one (CDT)", () => {
    expect(zonedInputToUtc("2027-11-07T01:30", CHI)?.toISOString()).toBe("2027-11-07T06:30:00.000Z");
    // The later 01:30 (CST) still displays as 01:30.
    expect(utcToZonedInput(new Date("2027-11-07T07:30:00Z"), CHI)).toBe("2027-11-07T01:30");
    expect(zonedInputToUtc("2027-11-07T02:00", CHI)?.toISOString()).toBe("2027-11-07T08:00:00.000Z");
  });

  it("refuses malformed and impossible values", () => {
    expect(zonedInputToUtc("", CHI)).toBeNull();
    expect(zonedInputToUtc("2027-02-29T10:00", CHI)).toBeNull();
    expect(zonedInputToUtc("2027-13-01T10:00", CHI)).toBeNull();
    expect(zonedInputToUtc("2027-01-01 10:00", CHI)).toBeNull();
    expect(zonedInputToUtc("2027-01-01T24:00", CHI)).toBeNull();
    expect(parseLocalInput("2028-02-29T10:00")).toEqual({ year: 2028, month: 2, day: 29, hour: 10, minute: 0 });
  });

  it("shows no date as an empty input", () => {
    expect(utcToZonedInput(null, CHI)).toBe("");
    expect(utcToZonedInput(undefined, CHI)).toBe("");
  });
});

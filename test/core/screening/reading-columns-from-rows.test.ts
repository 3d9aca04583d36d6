import { describe, expect, it } from "vitest";
import { readingColumnsFromRows, roleColumn } from "../../../lib/core/screening";

const row = (timeMs: number, hotInK: number | null) => ({
  timeMs,
  hotInK,
  hotOutK: 350,
  coldInK: 300,
  coldOutK: 320,
  hotFlowKgPerS: 2,
  coldFlowKgPerS: 3,
});

describe("readingColumnsFromRows", () => {
  it("sorts by time, turns null into NaN and keeps the last of duplicate times", () => {
    const rows = [row(3_600_000, 401), row(0, null), row(3_600_000, 402), row(Number.NaN, 1)];
    const columns = readingColumnsFromRows(rows);
    // definition: two distinct finite times survive, in increasing order
    expect(Array.from(columns.timeMs)).toEqual([0, 3_600_000]);
    expect(Number.isNaN(columns.hotInK[0] as number)).toBe(true);
    // definition: the later row for the same time replaces the earlier one
    expect(columns.hotInK[1]).toBe(402);
    expect(roleColumn(columns, "coldFlow")[1]).toBe(3);
    expect(rows[1]?.hotInK).toBeNull();
  });
});

import { describe, expect, it } from "vitest";
import { cusumAverageRunLength, cusumBlocks, firstCusumAlarm } from "../../../lib/core/faults";
import { seededRandom } from "../../../lib/core/simulate";

describe("firstCusumAlarm", () => {
  it("alarms on a shift and dates the change from the last zero of the CUSUM", () => {
    const values = new Float64Array(60);
    for (let index = 20; index < 60; index += 1) values[index] = 2;
    const alarm = firstCusumAlarm(values, 0, 0.5, 10);
    // Page (1954) tabular CUSUM by hand: C⁺ grows 1.5 per sample from index 20, exceeds 10 at the 7th (index 26)
    expect(alarm).toEqual({ alarmIndex: 26, onsetIndex: 20, direction: 1, statistic: 10.5 });
  });

  it("alarms downwards, passes over NaN and starts where told", () => {
    const values = new Float64Array(40).fill(-3);
    values[5] = Number.NaN;
    // by hand: C⁻ grows 2.5 per used sample; from index 2 it exceeds 4 at the second used sample (index 3)
    expect(firstCusumAlarm(values, 2, 0.5, 4)).toMatchObject({ alarmIndex: 3, onsetIndex: 2, direction: -1 });
    expect(firstCusumAlarm(new Float64Array(10), 0, 0.5, 4)).toBeNull();
  });
});

describe("cusumAverageRunLength", () => {
  it("is close to the tabulated in-control ARL for k = 0.5, h = 5", () => {
    // Montgomery (2009), Introduction to Statistical Quality Control 6th ed., Table 9.3 (from memory): ARL₀ = 465
    expect(cusumAverageRunLength(0.5, 5, 0) / 465).toBeCloseTo(1, 1);
    // Siegmund's formula evaluated by hand for h = 10: (e^(11.166) − 11.166 − 1)/0.5 per side, halved: ≈ 70 674
    expect(cusumAverageRunLength(0.5, 10, 0)).toBeCloseTo(70_673.6, 0);
  });

  it("agrees with a simulated run length for k = 0.5, h = 5 and for a 1σ shift", () => {
    const random = seededRandom(4242);
    const runLength = (shift: number): number => {
      let upper = 0;
      let lower = 0;
      for (let count = 1; ; count += 1) {
        const z = shift + random.normal();
        upper = Math.max(0, upper + z - 0.5);
        lower = Math.max(0, lower - z - 0.5);
        if (upper > 5 || lower > 5) return count;
      }
    };
    let total = 0;
    for (let run = 0; run < 400; run += 1) total += runLength(0);
    const simulated = total / 400;
    // simulation with known truth: run lengths are about geometric, so the mean of 400 has a standard error of
    // about 465/√400 ≈ 23; asserted within 20 % of Siegmund's value
    expect(simulated / cusumAverageRunLength(0.5, 5, 0)).toBeGreaterThan(0.8);
    expect(simulated / cusumAverageRunLength(0.5, 5, 0)).toBeLessThan(1.2);
    let shifted = 0;
    for (let run = 0; run < 400; run += 1) shifted += runLength(1);
    // Montgomery (2009), Table 9.3 (from memory): ARL = 10.4 for a 1σ shift; Siegmund gives about 10.4 as well
    expect(shifted / 400 / cusumAverageRunLength(0.5, 5, 1)).toBeCloseTo(1, 0);
  });
});

describe("cusumBlocks", () => {
  it("sums standardised values per block and scales by √n", () => {
    const time = Float64Array.from([0, 1, 2, 10, 11, 25], (value) => value * 60_000);
    const values = Float64Array.from([1, 1, 1, 2, Number.NaN, 3]);
    const blocks = cusumBlocks(time, values, 10 * 60_000);
    // definition: blocks [0, 10), [10, 20), [20, 30) minutes; Σz/√n = 3/√3, 2/1, 3/1
    expect(Array.from(blocks.values)).toEqual([3 / Math.sqrt(3), 2, 3]);
    expect(Array.from(blocks.first)).toEqual([0, 3, 5]);
    expect(Array.from(blocks.last)).toEqual([2, 3, 5]);
  });
});

// Deterministic operating data of one exchanger at a fixed step, as canonical CSV text (for the import benchmark
// and the crash-safety tests). No randomness: each value is a smooth function of the row index plus a small
// deterministic wobble, so every run writes the same bytes.

export const SAMPLE_HEADER = "timestamp,hot_in_C,hot_out_C,cold_in_C,cold_out_C,hot_flow_kg_s,cold_flow_kg_s,hot_dp_kPa";

export interface SampleReading {
  timeMs: number;
  hotInC: number;
  hotOutC: number;
  coldInC: number;
  coldOutC: number;
  hotFlowKgPerS: number;
  coldFlowKgPerS: number;
  hotPressureDropKPa: number;
}

const MINUTES_PER_DAY = 1440;
const DAYS_PER_YEAR = 365;

/** Row `index` of the series: daily and yearly cycles, a slow fouling trend, a wobble from a multiplicative hash. */
export function sampleReading(index: number, startMs: number, stepMs = 60_000): SampleReading {
  const day = (2 * Math.PI * (index % MINUTES_PER_DAY)) / MINUTES_PER_DAY;
  const year = (2 * Math.PI * index) / (MINUTES_PER_DAY * DAYS_PER_YEAR);
  // Knuth's multiplicative hash (2654435761, The Art of Computer Programming vol. 3, 6.4) folded to [-0.5, 0.5).
  const wobble = ((Math.imul(index + 1, 2654435761) >>> 0) / 2 ** 32) - 0.5;
  const fouling = index / (MINUTES_PER_DAY * DAYS_PER_YEAR);
  return {
    timeMs: startMs + index * stepMs,
    hotInC: round(180 + 6 * Math.sin(year) + 2 * Math.sin(day) + 0.3 * wobble, 2),
    hotOutC: round(120 + 4 * Math.sin(year) + 8 * fouling + 0.3 * wobble, 2),
    coldInC: round(25 + 8 * Math.sin(year - 0.5) + 1.5 * Math.sin(day) + 0.2 * wobble, 2),
    coldOutC: round(75 + 5 * Math.sin(year) - 6 * fouling + 0.2 * wobble, 2),
    hotFlowKgPerS: round(12 + 0.8 * Math.sin(day * 2) + 0.1 * wobble, 3),
    coldFlowKgPerS: round(15 + 0.5 * Math.sin(day) + 0.1 * wobble, 3),
    hotPressureDropKPa: round(45 + 20 * fouling + wobble, 2),
  };
}

function round(value: number, decimals: number): number {
  const scale = 10 ** decimals;
  return Math.round(value * scale) / scale;
}

export function sampleCsvLine(reading: SampleReading): string {
  return `${new Date(reading.timeMs).toISOString()},${reading.hotInC},${reading.hotOutC},${reading.coldInC},${reading.coldOutC},${reading.hotFlowKgPerS},${reading.coldFlowKgPerS},${reading.hotPressureDropKPa}`;
}

/** The CSV (header first, LF line ends) in chunks of `linesPerChunk` lines, generated as it is read. */
export function* sampleCsvChunks(rows: number, startMs: number, linesPerChunk = 2000): Generator<string> {
  yield `${SAMPLE_HEADER}\n`;
  for (let first = 0; first < rows; first += linesPerChunk) {
    const lines: string[] = [];
    for (let index = first; index < Math.min(rows, first + linesPerChunk); index++) lines.push(sampleCsvLine(sampleReading(index, startMs)));
    yield `${lines.join("\n")}\n`;
  }
}

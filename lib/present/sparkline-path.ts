// A small trend line as SVG path data, scaled to a box: server-rendered, no chart library per table row.

export interface SparklineGeometry {
  /** SVG path data ("M x y L x y ..."), "" with fewer than two points. */
  path: string;
  /** The last point, for an end marker; null without points. */
  last: { x: number; y: number } | null;
  /** The y range the line spans (input units), for an accessible description. */
  min: number | null;
  max: number | null;
}

/**
 * sparklinePath: [time, value] points drawn into a width × height box with `pad` pixels inside each edge; time
 * runs left to right over the points' own span, value bottom to top over its own span (a flat series sits in the
 * middle). Non-finite points are skipped. Coordinates are rounded to 0.1 px to keep the markup small.
 */
export function sparklinePath(points: readonly (readonly [number, number])[], width: number, height: number, pad = 2): SparklineGeometry {
  const finite = points.filter(([time, value]) => Number.isFinite(time) && Number.isFinite(value));
  if (finite.length === 0) return { path: "", last: null, min: null, max: null };
  const times = finite.map(([time]) => time);
  const values = finite.map(([, value]) => value);
  const t0 = Math.min(...times);
  const t1 = Math.max(...times);
  const v0 = Math.min(...values);
  const v1 = Math.max(...values);
  const round = (value: number) => Math.round(value * 10) / 10;
  const x = (time: number) => round(t1 === t0 ? width / 2 : pad + ((time - t0) / (t1 - t0)) * (width - 2 * pad));
  const y = (value: number) => round(v1 === v0 ? height / 2 : height - pad - ((value - v0) / (v1 - v0)) * (height - 2 * pad));
  const coordinates = finite.map(([time, value]) => ({ x: x(time), y: y(value) }));
  const path = coordinates.length < 2 ? "" : coordinates.map((point, index) => `${index === 0 ? "M" : "L"}${point.x} ${point.y}`).join(" ");
  return { path, last: coordinates[coordinates.length - 1] ?? null, min: v0, max: v1 };
}

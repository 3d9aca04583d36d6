// Fouling resistance over the last year as a tiny server-rendered SVG line (no chart library per table row).
import { sparklinePath } from "@/lib/present/sparkline-path";

const WIDTH = 96;
const HEIGHT = 24;

/** `description` is read by screen readers in place of the drawing (e.g. "Rf rose from 1.2 to 3.4 ×10⁻⁴ m²·K/W"). */
export function RfSparkline({ points, description }: { points: readonly (readonly [number, number])[]; description: string }) {
  const geometry = sparklinePath(points, WIDTH, HEIGHT);
  if (!geometry.path) return <span className="subtle">—</span>;
  return (
    <svg className="sparkline" width={WIDTH} height={HEIGHT} viewBox={`0 0 ${WIDTH} ${HEIGHT}`} role="img" aria-label={description}>
      <title>{description}</title>
      <path d={geometry.path} fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinejoin="round" />
      {geometry.last ? <circle cx={geometry.last.x} cy={geometry.last.y} r="2" fill="currentColor" /> : null}
    </svg>
  );
}

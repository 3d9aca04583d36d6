/**
 * formatInstant: an epoch-ms instant as "2026-08-19 14:00 UTC" for evidence texts (deterministic, no locale or clock).
 *
 * @example formatInstant(Date.UTC(2026, 7, 19, 14)) // "2026-08-19 14:00 UTC"
 */
export function formatInstant(timeMs: number): string {
  return `${new Date(timeMs).toISOString().slice(0, 16).replace("T", " ")} UTC`;
}

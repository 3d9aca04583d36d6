/**
 * formatUtcDate: the UTC calendar date of an instant, "YYYY-MM-DD" (ISO 8601 extended) or "YYYYMMDD" (basic, as
 * iCalendar DATE values use).
 *
 * @param instantMs epoch ms
 * @param style "extended" (default) or "basic"
 */
export function formatUtcDate(instantMs: number, style: "extended" | "basic" = "extended"): string {
  const date = new Date(instantMs);
  const year = String(date.getUTCFullYear()).padStart(4, "0");
  const month = String(date.getUTCMonth() + 1).padStart(2, "0");
  const day = String(date.getUTCDate()).padStart(2, "0");
  return style === "basic" ? `${year}${month}${day}` : `${year}-${month}-${day}`;
}

// Compact ISO 8601 text of an instant for messages: 2026-03-01T10:00Z, with seconds and milliseconds only when set.

export function formatInstant(ms: number): string {
  const iso = new Date(ms).toISOString(); // 2026-03-01T10:00:00.000Z
  if (iso.endsWith(":00.000Z")) return `${iso.slice(0, 16)}Z`;
  if (iso.endsWith(".000Z")) return `${iso.slice(0, 19)}Z`;
  return iso;
}

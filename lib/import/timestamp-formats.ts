// The timestamp formats an import understands.

/**
 * "auto" picks one of the others from the first rows (see detectTimestampFormat). Local formats (every one except
 * epoch-seconds, epoch-ms and an ISO time with an offset) are read in the mapping's time zone. Day, month and hour
 * may have one digit; seconds and a fraction (up to milliseconds are kept) are optional; a date alone means midnight.
 */
export const TIMESTAMP_FORMATS = [
  "auto",
  "iso",
  "YYYY-MM-DD HH:mm[:ss]",
  "DD/MM/YYYY HH:mm[:ss]",
  "MM/DD/YYYY HH:mm[:ss]",
  "DD.MM.YYYY HH:mm[:ss]",
  "epoch-seconds",
  "epoch-ms",
] as const;

export type TimestampFormat = (typeof TIMESTAMP_FORMATS)[number];
export type ConcreteTimestampFormat = Exclude<TimestampFormat, "auto">;

export const TIMESTAMP_FORMAT_DESCRIPTIONS: { readonly [F in TimestampFormat]: string } = {
  auto: "detect from the first rows",
  iso: "ISO 8601: 2026-03-01T10:00:00Z, 2026-03-01 10:00+01:00, or local 2026-03-01T10:00",
  "YYYY-MM-DD HH:mm[:ss]": "local time, 2026-03-01 10:00[:00]",
  "DD/MM/YYYY HH:mm[:ss]": "local time, 01/03/2026 10:00[:00] (day first)",
  "MM/DD/YYYY HH:mm[:ss]": "local time, 03/01/2026 10:00[:00] (month first)",
  "DD.MM.YYYY HH:mm[:ss]": "local time, 01.03.2026 10:00[:00]",
  "epoch-seconds": "seconds since 1970-01-01T00:00Z (UTC)",
  "epoch-ms": "milliseconds since 1970-01-01T00:00Z (UTC)",
};

/** True for formats whose times carry no offset and are read in a time zone (ISO only when it has no offset). */
export function isLocalFormat(format: ConcreteTimestampFormat): boolean {
  return format !== "epoch-seconds" && format !== "epoch-ms";
}

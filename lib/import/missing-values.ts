// Cell texts that mean "no value": stored as null, never a reason to reject a row on their own.

/**
 * Matched after trimming, ignoring letter case. Sources: spreadsheet error values (#N/A and friends, as Excel and
 * LibreOffice write them), the text forms of "not a number" and null that numerical tools and databases export,
 * and digital-state texts that plant historians write into exported value cells when a tag has no good value
 * (Bad, Bad Input, I/O Timeout, Comm Fail, Scan Off, Shutdown and similar) — common practice, from memory of
 * historian exports; extend the list when a site's exports show another one.
 */
export const MISSING_VALUE_MARKERS: readonly string[] = [
  "",
  "nan",
  "-nan",
  "null",
  "none",
  "nil",
  "na",
  "n/a",
  "#n/a",
  "#na",
  "#value!",
  "#div/0!",
  "#ref!",
  "#num!",
  "#null!",
  "#name?",
  "-",
  "--",
  "?",
  "bad",
  "bad data",
  "bad input",
  "bad quality",
  "i/o timeout",
  "comm fail",
  "no data",
  "no sample",
  "no value",
  "not connected",
  "scan off",
  "scan timeout",
  "shutdown",
  "calc failed",
  "out of serv",
  "out of service",
  "pt created",
  "configure",
  "invalid",
  "error",
  "over range",
  "under range",
];

const MARKERS = new Set(MISSING_VALUE_MARKERS);

/** True when the cell holds no value (empty or one of MISSING_VALUE_MARKERS). */
export function isMissingValue(cell: string): boolean {
  return MARKERS.has(cell.trim().toLowerCase());
}

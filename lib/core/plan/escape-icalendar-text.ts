/**
 * escapeICalendarText: a TEXT property value escaped per RFC 5545 §3.3.11: backslash → \\, semicolon → \;,
 * comma → \,, and every line break (CRLF, LF or CR) → \n.
 *
 * Source: RFC 5545 (Desruisseaux 2009), Internet Calendaring and Scheduling Core Object Specification, §3.3.11.
 *
 * @example escapeICalendarText("a,b;c\\d\ne") // "a\\,b\\;c\\\\d\\ne"
 */
export function escapeICalendarText(text: string): string {
  return text.replace(/\\/g, "\\\\").replace(/;/g, "\\;").replace(/,/g, "\\,").replace(/\r\n|\n|\r/g, "\\n");
}

const ENCODER = new TextEncoder();

/** Longest line in octets, excluding the CRLF (RFC 5545 §3.1). */
const MAXIMUM_LINE_OCTETS = 75;

/**
 * foldICalendarLine: one content line folded per RFC 5545 §3.1: pieces of at most 75 octets (UTF-8), each
 * continuation starting with one space (which counts towards its 75), joined by CRLF; a multi-octet character is
 * never split.
 *
 * Source: RFC 5545 (Desruisseaux 2009), §3.1 "Content Lines".
 *
 * @param line an unfolded content line without line break
 * @returns the folded line without a trailing CRLF
 */
export function foldICalendarLine(line: string): string {
  const pieces: string[] = [];
  let current = "";
  let octets = 0;
  let limit = MAXIMUM_LINE_OCTETS;
  for (const character of line) {
    const size = ENCODER.encode(character).length;
    if (octets + size > limit) {
      pieces.push(current);
      current = " ";
      octets = 1;
      limit = MAXIMUM_LINE_OCTETS;
    }
    current += character;
    octets += size;
  }
  pieces.push(current);
  return pieces.join("\r\n");
}

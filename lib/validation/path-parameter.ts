// A dynamic segment of a route's path (an asset tag) as text the database can hold.

/**
 * pathParameter: the segment percent-decoded (decodeURIComponent), or null when it is not valid percent-encoding
 * of UTF-8 (RFC 3986 §2.1; decodeURIComponent throws URIError on "%E0%A4%A") or holds a NUL character, which a
 * PostgreSQL text value cannot hold (PostgreSQL docs, "Character Types"). Routes answer 400 for null instead of
 * letting the URIError or the database error escape as a 500.
 */
export function pathParameter(segment: string): string | null {
  let text: string;
  try {
    text = decodeURIComponent(segment);
  } catch {
    return null;
  }
  return text.includes("\0") ? null : text;
}

/** The 400 message for a segment pathParameter refused. */
export function badPathParameterMessage(name: string, segment: string): string {
  return `the ${name} in the path is not valid percent-encoded text: ${JSON.stringify(segment.slice(0, 80))}`;
}

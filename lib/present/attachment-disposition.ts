// The Content-Disposition header of a download, safe for any file name.
import { safeFileName } from "../import/safe-file-name";

/** RFC 8187 §3.2.1 attr-char: ALPHA / DIGIT / "!" "#" "$" "&" "+" "-" "." "^" "_" "`" "|" "~"; the rest is %XX-encoded. */
function encodeExtendedValue(text: string): string {
  return Array.from(new TextEncoder().encode(text), (byte) => {
    const character = String.fromCharCode(byte);
    return /[A-Za-z0-9!#$&+\-.^_`|~]/.test(character) ? character : `%${byte.toString(16).toUpperCase().padStart(2, "0")}`;
  }).join("");
}

/**
 * attachmentDisposition: `attachment; filename="…"` for a download (RFC 6266 §4), the name first reduced by
 * safeFileName (last path segment, no control characters, so no CR/LF can split the header). The quoted
 * `filename` is printable ASCII without `"` and `\` (others become "_"; RFC 6266 §4.3 advises an ASCII fallback);
 * a name with other characters also gets `filename*=UTF-8''…` (RFC 8187 encoding), which browsers prefer.
 *
 * @example attachmentDisposition("import-12-rejects.csv") // 'attachment; filename="import-12-rejects.csv"'
 */
export function attachmentDisposition(fileName: string): string {
  const name = safeFileName(fileName);
  const fallback = name.replace(/[^\x20-\x7e]|["\\]/g, "_");
  const header = `attachment; filename="${fallback}"`;
  return fallback === name ? header : `${header}; filename*=UTF-8''${encodeExtendedValue(name)}`;
}

// A file name given by a user (upload, query parameter, CLI path) reduced to a label for display and records.

/** What an import is called when the name given is empty or nothing of it is left. */
export const DEFAULT_FILE_NAME = "upload.csv";

/** Longest name kept, in UTF-16 code units (255: the common file-name limit of ext4 and NTFS, common practice). */
export const MAX_FILE_NAME_LENGTH = 255;

// C0 controls and DEL, C1 controls, and the Unicode bidirectional controls (which can make "evil.exe‮vsc.csv"
// display reversed; Unicode Standard Annex #9), and U+FEFF.
const UNSAFE_CHARACTERS = /[\u0000-\u001f\u007f-\u009f\u200e\u200f\u202a-\u202e\u2066-\u2069\ufeff]/g;
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g;

/**
 * safeFileName: the name under which an import is recorded and shown. A name from a user never becomes a
 * filesystem path in Foulcast (the server opens no file it is told of); this keeps it harmless wherever it is
 * shown: only the last path segment ("../../etc/passwd" → "passwd", "C:\\x\\y.csv" → "y.csv"), control and
 * bidirectional-control characters removed (NUL, which PostgreSQL text cannot hold; CR and LF, which would split a
 * header or a log line), blanks trimmed, at most MAX_FILE_NAME_LENGTH code units (never cutting a surrogate pair);
 * "", "." and ".." become DEFAULT_FILE_NAME.
 */
export function safeFileName(name: string): string {
  const segments = name.replace(UNSAFE_CHARACTERS, "").split(/[/\\]/);
  let kept = (segments[segments.length - 1] ?? "").trim();
  if (kept.length > MAX_FILE_NAME_LENGTH) {
    kept = kept.slice(0, MAX_FILE_NAME_LENGTH);
    if (/[\ud800-\udbff]$/.test(kept)) kept = kept.slice(0, -1);
    kept = kept.trim();
  }
  // lone surrogates (not valid UTF-8, refused by PostgreSQL) become U+FFFD
  kept = kept.replace(LONE_SURROGATE, "\ufffd");
  return kept === "" || kept === "." || kept === ".." ? DEFAULT_FILE_NAME : kept;
}

// A small quote-aware CSV reader for the first kilobytes of a file: delimiter detection and the upload preview.
// The import itself streams through csv-parse; this one holds its whole (small) input.

export interface SampleRecord {
  /** Physical line where the record starts (1-based). */
  line: number;
  fields: string[];
}

/**
 * Splits `text` into records of fields: fields may be quoted with ", a doubled "" inside quotes is one quote,
 * quoted fields may hold delimiters and line breaks; line breaks are CRLF, LF or CR; a leading byte-order mark is
 * dropped. When `complete` is false (the text is the start of a longer file) the last record is dropped, since it
 * may be cut. Blank lines give no record.
 */
export function splitCsvSample(text: string, delimiter: string, complete = true): SampleRecord[] {
  const source = text.startsWith("\uFEFF") ? text.slice(1) : text;
  const records: SampleRecord[] = [];
  let fields: string[] = [];
  let field = "";
  let quoted = false;
  let line = 1;
  let recordLine = 1;
  let fieldStarted = false;
  const endRecord = () => {
    fields.push(field);
    if (fields.length > 1 || fields[0] !== "" || fieldStarted) records.push({ line: recordLine, fields });
    fields = [];
    field = "";
    fieldStarted = false;
  };
  for (let index = 0; index < source.length; index++) {
    const char = source[index] as string;
    if (quoted) {
      if (char === '"') {
        if (source[index + 1] === '"') {
          field += '"';
          index++;
        } else {
          quoted = false;
        }
      } else {
        if (char === "\n" || (char === "\r" && source[index + 1] !== "\n")) line++;
        field += char;
      }
      continue;
    }
    if (char === '"' && field === "") {
      quoted = true;
      fieldStarted = true;
    } else if (char === delimiter) {
      fields.push(field);
      field = "";
      fieldStarted = true;
    } else if (char === "\r" || char === "\n") {
      if (char === "\r" && source[index + 1] === "\n") index++;
      endRecord();
      line++;
      recordLine = line;
    } else {
      field += char;
    }
  }
  const pending = quoted || field !== "" || fields.length > 0 || fieldStarted;
  // A record not ended by a line break is whole only when the text is the whole file.
  if (pending && complete) endRecord();
  return records;
}

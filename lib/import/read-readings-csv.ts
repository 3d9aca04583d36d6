// Streaming reader of an operating-data CSV: bytes in, batches of SI readings out, every rejected row listed.
// No database here: lib/data/import-readings.ts writes the batches.
import { CsvError, parse } from "csv-parse";
import { Readable } from "node:stream";
import type { ColumnMapping } from "../validation/column-mapping";
import { mappingFromCanonicalHeaders } from "./canonical-header";
import { checkUnitPlausibility } from "./check-unit-plausibility";
import { RowConverter } from "./convert-row";
import { detectDecimalMark } from "./detect-decimal-mark";
import { detectDelimiter, type Delimiter } from "./detect-delimiter";
import { detectTimestampFormat } from "./detect-timestamp-format";
import { ImportFailure, ImportRefusal, type RefusalCode, type RejectedRow } from "./import-errors";
import type { ImportLimits } from "./import-limits";
import { LineIndex } from "./line-index";
import { MEASUREMENT_ROLES, type MeasurementRole } from "./measurement-roles";
import { parseNumber, type DecimalMark } from "./parse-number";
import { resolveColumns, type ResolvedColumns } from "./resolve-columns";
import { splitCsvSample } from "./split-csv-sample";
import type { ConcreteTimestampFormat, TimestampFormat } from "./timestamp-formats";
import { isValidTimeZone } from "./zone-offset";

/** Bytes read before the delimiter is chosen. */
export const SAMPLE_BYTES = 64 * 1024;
/** Longest record csv-parse will hold (a longer one is almost always an unclosed quote). */
export const MAX_RECORD_CHARACTERS = 64 * 1024;

export type MappingSource = "explicit" | "saved" | "canonical";

/** Settings that replace the mapping's own (CLI options, query parameters). */
export interface ImportOverrides {
  timeZone?: string;
  decimalMark?: DecimalMark;
  delimiter?: Delimiter;
  timestampFormat?: TimestampFormat;
}

export interface ImportProgress {
  bytesRead: number;
  rowsRead: number;
}

/** Accepted rows, column by column; roles the file does not map hold nulls. Values in SI (K, kg/s, Pa). */
export interface ReadingBatch {
  lines: number[];
  timesMs: number[];
  values: Record<MeasurementRole, (number | null)[]>;
}

/** How the file was read, known once the header and the first rows are in. */
export interface ReadingsCsvSettings {
  mappingSource: MappingSource;
  /** The mapping used, with the overrides applied ("auto" kept where it was asked for). */
  mapping: ColumnMapping;
  delimiter: Delimiter;
  decimalMark: DecimalMark;
  timestampFormat: ConcreteTimestampFormat;
  timeZone: string;
  columns: ResolvedColumns;
}

export interface ReadingsCsvOptions {
  /** Explicit or saved mapping; null reads canonical headers. */
  mapping: ColumnMapping | null;
  mappingSource: MappingSource;
  /** For a saved mapping: when its columns are not in the file but the header is canonical, read it as canonical. */
  fallbackToCanonical?: boolean;
  overrides?: ImportOverrides;
  /** Time zone for local timestamps when neither the overrides nor the mapping give one (the site's). */
  defaultTimeZone: string;
  /** Skip the wrong-unit check of the first rows. */
  trustUnits?: boolean;
  limits: ImportLimits;
  /** Size the stream should have (HTTP Content-Length, file size): a stream that ends short of it failed. */
  expectedBytes?: number;
  onBatch: (batch: ReadingBatch) => Promise<void>;
  onProgress?: (progress: ImportProgress) => void;
}

interface PendingRecord {
  fields: string[];
  line: number;
}

function newBatch(): ReadingBatch {
  const values = {} as Record<MeasurementRole, (number | null)[]>;
  for (const role of MEASUREMENT_ROLES) values[role] = [];
  return { lines: [], timesMs: [], values };
}

/** Line breaks in a field: CRLF, LF and CR count one each. */
function countLineBreaks(text: string): number {
  let count = 0;
  for (let index = 0; index < text.length; index++) {
    const code = text.charCodeAt(index);
    if (code === 10) count += 1;
    else if (code === 13) {
      count += 1;
      if (text.charCodeAt(index + 1) === 10) index += 1;
    }
  }
  return count;
}

function isBlank(fields: readonly string[]): boolean {
  return fields.every((field) => field.trim() === "");
}

function toBuffer(chunk: unknown): Buffer {
  if (Buffer.isBuffer(chunk)) return chunk;
  if (typeof chunk === "string") return Buffer.from(chunk, "utf8");
  if (chunk instanceof Uint8Array) return Buffer.from(chunk.buffer, chunk.byteOffset, chunk.byteLength);
  throw new ImportFailure("the upload stream gave something other than bytes or text");
}

/** Refuses files that are evidently not UTF-8 text: UTF-16 (Excel "Unicode text"), a zip (.xlsx), NUL bytes. */
function refuseNonText(sample: Buffer): void {
  const first = sample[0];
  const second = sample[1];
  if ((first === 0xff && second === 0xfe) || (first === 0xfe && second === 0xff)) {
    throw new ImportRefusal("unreadable", "the file is UTF-16 text (a byte-order mark FF FE or FE FF); save it as CSV in UTF-8");
  }
  if (sample.subarray(0, 4).equals(Buffer.from([0x50, 0x4b, 0x03, 0x04]))) {
    throw new ImportRefusal("unreadable", "the file is a zip archive (an .xlsx workbook?), not CSV text; save the sheet as CSV");
  }
  if (sample.includes(0)) throw new ImportRefusal("unreadable", "the file is not text (it contains NUL bytes); export the data as CSV");
}

/**
 * Reads an operating-data CSV as a stream, holding only the first 64 KiB, the first unitCheckRows records and one
 * batch at a time:
 * 1. from the first 64 KiB: refuse non-text files; choose the delimiter (given, or detectDelimiter);
 * 2. parse records with csv-parse (BOM, quotes, CRLF/LF/CR, fields with line breaks); skip blank lines and lines
 *    of empty fields; count physical lines so every row has the line it starts on;
 * 3. header: resolve the mapping (explicit or saved, else canonical headers) to field indexes;
 * 4. first unitCheckRows rows: choose the decimal mark and timestamp format when "auto"; refuse a wrong unit;
 * 5. every row: RowConverter; accepted rows go out in batches through onBatch (awaited: back-pressure), rejected
 *    ones are counted and listed (first maxRejectsKept);
 * 6. refuse when more than maxRejectShare of the first rejectSampleRows rows (or of a shorter file) are rejected.
 * Statistics stay readable on the object after a refusal.
 *
 * @throws ImportRefusal for a file that cannot be imported as given; ImportFailure when the stream itself fails
 */
export class ReadingsCsvReader {
  bytesRead = 0;
  rowsRead = 0;
  rowsAccepted = 0;
  rowsRejected = 0;
  rejects: RejectedRow[] = [];
  firstTimeMs: number | null = null;
  lastTimeMs: number | null = null;
  settings: ReadingsCsvSettings | null = null;
  /** Named columns of the header no role uses. */
  ignoredColumns: string[] = [];

  private readonly options: ReadingsCsvOptions;
  private converter: RowConverter | null = null;
  private pending: PendingRecord[] = [];
  private batch: ReadingBatch = newBatch();
  private shareChecked = false;
  private delimiter: Delimiter = ",";
  private unmappedRoles: MeasurementRole[] = [];
  /** Set when the sample showed that a saved mapping does not fit but canonical headers do. */
  private canonicalFallback = false;
  /** The batch being written while the next one is parsed (one at a time: parsing and writing overlap). */
  private inFlight: Promise<void> | null = null;

  constructor(options: ReadingsCsvOptions) {
    this.options = options;
  }

  private refuse(code: RefusalCode, message: string): never {
    throw new ImportRefusal(code, message, this.rejects);
  }

  private countBytes(count: number): void {
    this.bytesRead += count;
    const { maxBytes } = this.options.limits;
    if (this.bytesRead > maxBytes) {
      this.refuse("too-large", `the file is larger than the limit of ${maxBytes.toLocaleString("en-US")} bytes (FOULCAST_MAX_IMPORT_BYTES); split it into smaller files`);
    }
  }

  /** Reads the whole stream. Resolves when every accepted row has gone through onBatch. */
  async read(source: AsyncIterable<unknown>): Promise<void> {
    const iterator = source[Symbol.asyncIterator]();
    const nextChunk = async (): Promise<Buffer | null> => {
      let next: IteratorResult<unknown>;
      try {
        next = await iterator.next();
      } catch (error) {
        if (error instanceof ImportRefusal || error instanceof ImportFailure) throw error;
        throw new ImportFailure(`the file could not be read to the end: ${error instanceof Error ? error.message : String(error)}`, { cause: error });
      }
      if (next.done) return null;
      const buffer = toBuffer(next.value);
      this.countBytes(buffer.length);
      return buffer;
    };
    let input: Readable | null = null;
    let parser: ReturnType<typeof parse> | null = null;
    try {
      const sampleChunks: Buffer[] = [];
      let sampleBytes = 0;
      let ended = false;
      while (sampleBytes < SAMPLE_BYTES) {
        const chunk = await nextChunk();
        if (chunk === null) {
          ended = true;
          break;
        }
        sampleChunks.push(chunk);
        sampleBytes += chunk.length;
      }
      const sample = Buffer.concat(sampleChunks);
      refuseNonText(sample);
      const sampleText = sample.toString("utf8");
      this.delimiter = this.chooseDelimiter(sampleText, ended);
      // csv-parse's error gives the byte offset of the record it could not finish; this turns it into a line.
      // Kept: enough bytes for the longest record csv-parse holds (4 bytes per character at most in UTF-8).
      const lines = new LineIndex(4 * MAX_RECORD_CHARACTERS + SAMPLE_BYTES);
      async function* chunks(): AsyncGenerator<Buffer> {
        try {
          for (const chunk of sampleChunks) {
            lines.add(chunk);
            yield chunk;
          }
          sampleChunks.length = 0;
          if (ended) return;
          for (let chunk = await nextChunk(); chunk !== null; chunk = await nextChunk()) {
            lines.add(chunk);
            yield chunk;
          }
        } finally {
          await iterator.return?.();
        }
      }
      parser = parse({
        delimiter: this.delimiter,
        bom: true,
        relax_column_count: true,
        relax_quotes: true,
        record_delimiter: ["\r\n", "\n", "\r"],
        max_record_size: MAX_RECORD_CHARACTERS,
      });
      const activeParser = parser;
      input = Readable.from(chunks(), { objectMode: false });
      input.on("error", (error) => activeParser.destroy(error));
      input.pipe(activeParser);
      let header: string[] | null = null;
      // A record starts one line after the previous record's start, plus the line breaks inside its quoted fields.
      let nextLine = 1;
      try {
        for await (const fields of activeParser as AsyncIterable<string[]>) {
          const line = nextLine;
          nextLine += 1;
          for (const field of fields) if (field.includes("\n") || field.includes("\r")) nextLine += countLineBreaks(field);
          if (isBlank(fields)) continue;
          if (header === null) {
            header = fields;
            this.resolveHeader(header);
            continue;
          }
          await this.accept({ fields, line });
        }
      } catch (error) {
        if (error instanceof CsvError) {
          const offset = typeof error.bytes === "number" ? error.bytes : null;
          this.refuseUnreadable(error, (offset === null ? null : lines.lineAt(offset)) ?? nextLine);
        }
        throw error;
      }
      const { expectedBytes } = this.options;
      if (expectedBytes !== undefined && this.bytesRead < expectedBytes) {
        throw new ImportFailure(`the file arrived incomplete: ${this.bytesRead} of ${expectedBytes} bytes (was the upload interrupted?); nothing was imported`);
      }
      if (header === null) this.refuse("empty", "the file has no data rows (it is empty)");
      if (this.converter === null) await this.startConverting();
      await this.flush();
      await this.settle();
      this.checkRejectShare(true);
      if (this.rowsRead === 0) this.refuse("empty", "the file has no data rows (only a header)");
      if (this.rowsAccepted === 0) this.refuse("too-many-rejects", `none of the ${this.rowsRead} rows could be read. ${this.firstReasons()}`);
      this.options.onProgress?.({ bytesRead: this.bytesRead, rowsRead: this.rowsRead });
    } finally {
      // Let a batch still being written finish (or fail) before the caller moves on, e.g. to roll back.
      await this.inFlight?.catch(() => undefined);
      input?.destroy();
      parser?.destroy();
      await Promise.resolve(iterator.return?.()).catch(() => undefined);
    }
  }

  /**
   * Chooses the delimiter before parsing: the one given (override, then the mapping's), else detected. A saved
   * mapping that may fall back to canonical headers is tried on the sample's header first: when its columns are not
   * there but the header, split with the detected delimiter, is canonical, canonical headers and that delimiter are
   * used (a saved semicolon mapping must not stop a comma file with canonical headers).
   */
  private chooseDelimiter(sampleText: string, complete: boolean): Delimiter {
    const { mapping, overrides, fallbackToCanonical } = this.options;
    const detect = () => overrides?.delimiter ?? detectDelimiter(sampleText, complete);
    const given = overrides?.delimiter ?? (mapping && mapping.delimiter !== "auto" ? mapping.delimiter : undefined);
    const delimiter = given ?? detect();
    if (!mapping || !fallbackToCanonical) return delimiter;
    const header = splitCsvSample(sampleText, delimiter, complete)[0]?.fields;
    if (!header || resolveColumns(header, mapping).ok) return delimiter;
    const detected = detect();
    const canonicalHeader = splitCsvSample(sampleText, detected, complete)[0]?.fields;
    if (canonicalHeader && mappingFromCanonicalHeaders(canonicalHeader).ok) {
      this.canonicalFallback = true;
      return detected;
    }
    return delimiter;
  }

  private refuseUnreadable(error: CsvError, line: number): never {
    if (error.code === "CSV_QUOTE_NOT_CLOSED") {
      this.refuse("unreadable", `line ${line}: a quoted field opened here is never closed (the file ends inside quotes)`);
    }
    if (error.code === "CSV_MAX_RECORD_SIZE") {
      this.refuse("unreadable", `line ${line}: a row longer than ${MAX_RECORD_CHARACTERS.toLocaleString("en-US")} characters (is a quote not closed?)`);
    }
    this.refuse("unreadable", `line ${line}: the file cannot be read as CSV: ${error.message}`);
  }

  private resolveHeader(header: readonly string[]): void {
    const { mapping, mappingSource, fallbackToCanonical } = this.options;
    let used: { mapping: ColumnMapping; source: MappingSource } | null = null;
    if (mapping && !this.canonicalFallback) {
      const resolved = resolveColumns(header, mapping);
      if (resolved.ok) used = { mapping, source: mappingSource };
      else {
        const canonical = fallbackToCanonical ? mappingFromCanonicalHeaders(header) : null;
        if (canonical?.ok) used = { mapping: canonical.mapping, source: "canonical" };
        else this.refuse(resolved.code, `${resolved.message}${mappingSource === "saved" ? " (the asset's saved column mapping was used; give a mapping for this file)" : ""}`);
      }
    } else {
      const canonical = mappingFromCanonicalHeaders(header);
      if (!canonical.ok) this.refuse(canonical.code, canonical.message);
      // a fallback from a saved mapping keeps none of its settings (delimiter, decimal mark, formats)
      used = { mapping: canonical.mapping, source: "canonical" };
    }
    const overrides = this.options.overrides ?? {};
    const effective: ColumnMapping = {
      ...used.mapping,
      timestamp: { ...used.mapping.timestamp, format: overrides.timestampFormat ?? used.mapping.timestamp.format },
      delimiter: overrides.delimiter ?? used.mapping.delimiter,
      decimalMark: overrides.decimalMark ?? used.mapping.decimalMark,
      ...(overrides.timeZone ?? used.mapping.timeZone ? { timeZone: overrides.timeZone ?? used.mapping.timeZone } : {}),
    };
    const columns = resolveColumns(header, effective);
    if (!columns.ok) this.refuse(columns.code, columns.message);
    const timeZone = effective.timeZone ?? this.options.defaultTimeZone;
    if (!isValidTimeZone(timeZone)) this.refuse("invalid-mapping", `unknown time zone "${timeZone}"; give an IANA name such as Europe/Amsterdam or UTC`);
    this.ignoredColumns = columns.columns.ignoredColumns;
    this.settings = {
      mappingSource: used.source,
      mapping: effective,
      delimiter: this.delimiter,
      decimalMark: ".",
      timestampFormat: "iso",
      timeZone,
      columns: columns.columns,
    };
  }

  private async accept(record: PendingRecord): Promise<void> {
    if (this.converter === null) {
      this.pending.push(record);
      if (this.pending.length >= this.options.limits.unitCheckRows) await this.startConverting();
      return;
    }
    await this.convert(record);
  }

  /** Decides decimal mark and timestamp format, checks units on the held rows, then converts them. */
  private async startConverting(): Promise<void> {
    const settings = this.settings;
    if (!settings) return;
    const { columns, mapping } = settings;
    const held = this.pending;
    this.pending = [];
    if (held.length === 0) this.refuse("empty", "the file has no data rows (only a header)");
    const valueCells = held.flatMap((record) => columns.measurements.map((column) => record.fields[column.index] ?? ""));
    settings.decimalMark = mapping.decimalMark === "auto" ? detectDecimalMark(valueCells, settings.delimiter) : mapping.decimalMark;
    if (mapping.timestamp.format === "auto") {
      const detected = detectTimestampFormat(held.map((record) => record.fields[columns.timestamp.index] ?? ""), settings.timeZone);
      if (!detected.ok) this.refuse("timestamp-format", `column "${columns.timestamp.column}": ${detected.message}`);
      settings.timestampFormat = detected.format;
    } else {
      settings.timestampFormat = mapping.timestamp.format;
    }
    if (!this.options.trustUnits) {
      const samples = columns.measurements.map((column) =>
        held.flatMap((record) => {
          const parsed = parseNumber(record.fields[column.index] ?? "", settings.decimalMark);
          return parsed.kind === "number" ? [parsed.value] : [];
        }),
      );
      const problem = checkUnitPlausibility(columns.measurements, samples, held.length);
      if (problem) this.refuse("implausible-unit", problem);
    }
    this.unmappedRoles = MEASUREMENT_ROLES.filter((role) => !columns.measurements.some((column) => column.role === role));
    this.converter = new RowConverter({ columns, timestampFormat: settings.timestampFormat, timeZone: settings.timeZone, decimalMark: settings.decimalMark });
    for (const record of held) await this.convert(record);
  }

  private async convert(record: PendingRecord): Promise<void> {
    const converter = this.converter as RowConverter;
    const columns = (this.settings as ReadingsCsvSettings).columns;
    this.rowsRead += 1;
    const result = converter.convert(record.fields, record.line);
    if (result.ok) {
      this.rowsAccepted += 1;
      this.firstTimeMs ??= result.timeMs;
      this.lastTimeMs = result.timeMs;
      const batch = this.batch;
      batch.lines.push(record.line);
      batch.timesMs.push(result.timeMs);
      columns.measurements.forEach((column, position) => batch.values[column.role].push(result.values[position] ?? null));
      for (const role of this.unmappedRoles) batch.values[role].push(null);
      if (batch.lines.length >= this.options.limits.batchRows) await this.flush();
    } else {
      this.rowsRejected += 1;
      if (this.rejects.length < this.options.limits.maxRejectsKept) this.rejects.push({ line: record.line, reason: result.reason });
    }
    this.checkRejectShare(false);
  }

  /** Hands the current batch to onBatch once the previous one is written; does not wait for this one. */
  private async flush(): Promise<void> {
    if (this.batch.lines.length === 0) return;
    await this.settle();
    const batch = this.batch;
    this.batch = newBatch();
    const writing = this.options.onBatch(batch);
    // Handled when settled; the empty handler only keeps a failure from being reported as unhandled meanwhile.
    writing.catch(() => undefined);
    this.inFlight = writing;
    this.options.onProgress?.({ bytesRead: this.bytesRead, rowsRead: this.rowsRead });
  }

  /** Waits for the batch being written; its failure becomes the reader's. */
  private async settle(): Promise<void> {
    const writing = this.inFlight;
    this.inFlight = null;
    if (writing) await writing;
  }

  private firstReasons(): string {
    const shown = this.rejects.slice(0, 3).map((reject) => `line ${reject.line}: ${reject.reason}`);
    return shown.length ? `First reasons: ${shown.join("; ")}` : "";
  }

  private checkRejectShare(final: boolean): void {
    if (this.shareChecked) return;
    const { rejectSampleRows, maxRejectShare } = this.options.limits;
    if (!final && this.rowsRead < rejectSampleRows) return;
    this.shareChecked = true;
    if (this.rowsRead === 0 || this.rowsRejected <= maxRejectShare * this.rowsRead) return;
    const outOfOrder = this.rejects.filter((reject) => reject.reason.includes("rows must be in time order")).length;
    const hint =
      outOfOrder > this.rejects.length / 2
        ? "the rows seem to be in descending time order; sort the file oldest first"
        : "the column mapping, units, decimal mark or timestamp format are probably wrong";
    const scope = this.rowsRead >= rejectSampleRows ? `of the first ${this.rowsRead} rows` : `of the ${this.rowsRead} rows`;
    this.refuse(
      "too-many-rejects",
      `${this.rowsRejected} ${scope} were rejected (more than ${Math.round(maxRejectShare * 100)} %): ${hint}. ${this.firstReasons()}`.trim(),
    );
  }
}


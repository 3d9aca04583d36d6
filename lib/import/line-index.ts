// Physical line numbers of byte offsets near the end of what a stream has delivered so far.

const LF = 0x0a;
const CR = 0x0d;

interface Chunk {
  start: number;
  /** Line breaks before the chunk's first byte. */
  breaksBefore: number;
  /** The chunk starts with LF that ends a CRLF begun in the previous chunk (counted there). */
  continuesCrLf: boolean;
  data: Buffer;
}

/** Line breaks in bytes: CRLF, LF and CR count one each; `skipLeadingLf` drops an LF that ends an earlier CR. */
function countBreaks(data: Buffer, end: number, skipLeadingLf: boolean): number {
  let count = 0;
  for (let index = skipLeadingLf ? 1 : 0; index < end; index++) {
    const byte = data[index];
    if (byte === LF) count += 1;
    else if (byte === CR) {
      count += 1;
      if (data[index + 1] === LF) index += 1;
    }
  }
  return count;
}

/**
 * Keeps the last chunks of a stream (at least `keepBytes` of them) with the number of line breaks before each, so the
 * line of a recent byte offset can be told: used for the line of a record csv-parse could not finish (its error
 * gives the record's byte offset, while the records it had queued are lost with the stream).
 */
export class LineIndex {
  private readonly chunks: Chunk[] = [];
  private readonly keepBytes: number;
  private bytes = 0;
  private breaks = 0;
  private endsWithCr = false;

  constructor(keepBytes: number) {
    this.keepBytes = keepBytes;
  }

  add(data: Buffer): void {
    const continuesCrLf = this.endsWithCr && data[0] === LF;
    this.chunks.push({ start: this.bytes, breaksBefore: this.breaks, continuesCrLf, data });
    this.breaks += countBreaks(data, data.length, continuesCrLf);
    this.bytes += data.length;
    if (data.length > 0) this.endsWithCr = data[data.length - 1] === CR;
    while (this.chunks.length > 1 && this.bytes - (this.chunks[1]?.start ?? 0) >= this.keepBytes) this.chunks.shift();
  }

  /** 1-based line of the byte at `offset`, or null when that part of the stream is no longer kept. */
  lineAt(offset: number): number | null {
    if (offset >= this.bytes) return this.breaks + 1;
    const chunk = this.chunks.find((candidate) => offset >= candidate.start && offset < candidate.start + candidate.data.length);
    if (!chunk) return null;
    return chunk.breaksBefore + countBreaks(chunk.data, offset - chunk.start, chunk.continuesCrLf) + 1;
  }
}

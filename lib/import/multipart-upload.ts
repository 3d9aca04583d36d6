// Reads a multipart/form-data body (RFC 7578) as a stream: text fields before the file are collected, the first
// file part is handed on as a stream without being held in memory, and anything after it is ignored.
import { Readable } from "node:stream";
import { ImportRefusal } from "./import-errors";

export interface MultipartUpload {
  /** Text fields that came before the file part (e.g. mapping, timeZone). */
  fields: Record<string, string>;
  fileName: string;
  /** The file's bytes, streamed from the request. */
  file: Readable;
}

const MAX_HEADER_BYTES = 16 * 1024;
const MAX_FIELD_BYTES = 256 * 1024;
const CRLF = Buffer.from("\r\n");
const HEADER_END = Buffer.from("\r\n\r\n");

/** The boundary parameter of a multipart/form-data content type, or null. */
export function multipartBoundary(contentType: string): string | null {
  if (!/^multipart\/form-data\s*;/i.test(contentType)) return null;
  const match = /;\s*boundary=(?:"([^"]+)"|([^;\s]+))/i.exec(contentType);
  return match?.[1] ?? match?.[2] ?? null;
}

function bad(message: string): ImportRefusal {
  return new ImportRefusal("unreadable", `the multipart upload cannot be read: ${message}`);
}

function dispositionParameter(headers: string, name: string): string | null {
  const line = headers.split("\r\n").find((header) => /^content-disposition\s*:/i.test(header));
  if (!line) return null;
  const match = new RegExp(`;\\s*${name}="((?:[^"\\\\]|\\\\.)*)"`, "i").exec(line) ?? new RegExp(`;\\s*${name}=([^;\\s]+)`, "i").exec(line);
  return match?.[1]?.replace(/\\(.)/g, "$1") ?? null;
}

/**
 * Parses parts up to the first part with a filename and returns its content as a stream that ends at the next
 * boundary. Fields must come before the file to be seen (browsers send FormData parts in the order appended).
 *
 * @throws ImportRefusal ("unreadable") for a body that is not well-formed multipart, or one without a file part
 */
export async function readMultipartUpload(body: AsyncIterable<unknown>, boundary: string): Promise<MultipartUpload> {
  const iterator = body[Symbol.asyncIterator]();
  const delimiter = Buffer.from(`\r\n--${boundary}`);
  // A leading CRLF lets the first boundary (at the very start of the body) match the same delimiter.
  let buffer: Buffer = Buffer.from(CRLF);
  let finished = false;
  const more = async (): Promise<boolean> => {
    if (finished) return false;
    const next = await iterator.next();
    if (next.done) {
      finished = true;
      return false;
    }
    const value = next.value;
    const chunk = Buffer.isBuffer(value) ? value : typeof value === "string" ? Buffer.from(value) : Buffer.from(value as Uint8Array);
    buffer = buffer.length === 0 ? chunk : Buffer.concat([buffer, chunk]);
    return true;
  };
  /** Waits until `needle` is in the buffer (searching from `from`), reading at most `limit` bytes; returns its index. */
  const find = async (needle: Buffer, limit: number, what: string): Promise<number> => {
    for (;;) {
      const index = buffer.indexOf(needle);
      if (index >= 0) return index;
      if (buffer.length > limit) throw bad(`${what} is longer than ${limit} bytes`);
      if (!(await more())) throw bad(`the body ends inside ${what}`);
    }
  };
  const fields: Record<string, string> = {};
  // Preamble, then the first delimiter.
  const first = await find(delimiter, MAX_HEADER_BYTES, "the preamble");
  buffer = buffer.subarray(first + delimiter.length);
  for (;;) {
    // After a delimiter: "--" ends the body, CRLF starts a part.
    while (buffer.length < 2) if (!(await more())) throw bad("the body ends after a boundary");
    if (buffer[0] === 0x2d && buffer[1] === 0x2d) throw bad("no file part (a part with a filename) in the body");
    const headerEnd = await find(HEADER_END, MAX_HEADER_BYTES, "the part headers");
    const headers = buffer.subarray(0, headerEnd).toString("utf8").replace(/^\s*\r\n/, "");
    buffer = buffer.subarray(headerEnd + HEADER_END.length);
    const name = dispositionParameter(headers, "name");
    const fileName = dispositionParameter(headers, "filename");
    if (fileName !== null) {
      const source = async function* (): AsyncGenerator<Buffer> {
        try {
          for (;;) {
            const index = buffer.indexOf(delimiter);
            if (index >= 0) {
              if (index > 0) yield buffer.subarray(0, index);
              return;
            }
            // Keep a tail that could be the start of the delimiter; hand on the rest.
            const safe = buffer.length - (delimiter.length - 1);
            if (safe > 0) {
              const chunk = buffer.subarray(0, safe);
              buffer = buffer.subarray(safe);
              yield chunk;
            }
            if (!(await more())) throw bad("the body ends inside the file part (no closing boundary)");
          }
        } finally {
          await iterator.return?.();
        }
      };
      return { fields, fileName, file: Readable.from(source(), { objectMode: false }) };
    }
    const end = await find(delimiter, MAX_FIELD_BYTES, `the field "${name ?? ""}"`);
    if (name !== null) fields[name] = buffer.subarray(0, end).toString("utf8");
    buffer = buffer.subarray(end + delimiter.length);
  }
}

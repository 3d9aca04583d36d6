// The two error types an import throws. Anything else escaping importReadings is a bug.

/** Why a file was refused as a whole. Each code has one HTTP status (see REFUSAL_STATUS). */
export type RefusalCode =
  | "unknown-asset"
  | "too-large"
  | "empty"
  | "unreadable"
  | "invalid-mapping"
  | "missing-columns"
  | "duplicate-columns"
  | "unknown-unit"
  | "implausible-unit"
  | "timestamp-format"
  | "too-many-rejects";

/** HTTP status for each refusal: 404 unknown asset, 413 too large, 422 for a file that cannot be imported as given. */
export const REFUSAL_STATUS: { readonly [C in RefusalCode]: number } = {
  "unknown-asset": 404,
  "too-large": 413,
  empty: 422,
  unreadable: 422,
  "invalid-mapping": 422,
  "missing-columns": 422,
  "duplicate-columns": 422,
  "unknown-unit": 422,
  "implausible-unit": 422,
  "timestamp-format": 422,
  "too-many-rejects": 422,
};

export interface RejectedRow {
  /** Physical line of the file where the row starts (1-based; the header is line 1). */
  line: number;
  reason: string;
}

/**
 * The file (or the request) cannot be imported as given: nothing was written to the readings. The message says
 * what is wrong in the user's terms; `rejects` holds the row rejections found before the refusal, if any.
 */
export class ImportRefusal extends Error {
  readonly code: RefusalCode;
  readonly rejects: readonly RejectedRow[];
  /** Id of the ImportBatch recorded as failed, when one was recorded (set by importReadings). */
  batchId: number | null = null;

  constructor(code: RefusalCode, message: string, rejects: readonly RejectedRow[] = []) {
    super(message);
    this.name = "ImportRefusal";
    this.code = code;
    this.rejects = rejects;
  }

  get status(): number {
    return REFUSAL_STATUS[this.code];
  }
}

/**
 * The import stopped for a reason outside the file (the database connection was lost, the transaction ran out of
 * time): the transaction was rolled back and the readings are as they were. `cause` holds the original error.
 */
export class ImportFailure extends Error {
  batchId: number | null = null;

  constructor(message: string, options?: { cause?: unknown }) {
    super(message, options);
    this.name = "ImportFailure";
  }
}

export function isImportError(error: unknown): error is ImportRefusal | ImportFailure {
  return error instanceof ImportRefusal || error instanceof ImportFailure;
}

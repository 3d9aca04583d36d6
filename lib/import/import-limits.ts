// Limits of one import, resolved once: defaults, then environment, then the caller's options.

export interface ImportLimits {
  /** Largest file accepted, bytes (FOULCAST_MAX_IMPORT_BYTES; default 200 MB). */
  maxBytes: number;
  /** Largest share of rejected rows among the first rejectSampleRows rows before the file is refused (FOULCAST_IMPORT_MAX_REJECT_SHARE; default 0.5). */
  maxRejectShare: number;
  /** Rows the reject share is judged on (default 1000; the whole file when it is shorter). */
  rejectSampleRows: number;
  /** Rows whose medians are checked for a wrong unit (default 200). */
  unitCheckRows: number;
  /** Rejected rows listed in the report; the count is always complete (default 10,000). */
  maxRejectsKept: number;
  /** Rows written to the staging table per statement (default 5000). */
  batchRows: number;
  /** Longest time the import transaction may stay open, ms (FOULCAST_IMPORT_TIMEOUT_MS; default 30 min). */
  transactionTimeoutMs: number;
}

export const DEFAULT_IMPORT_LIMITS: Readonly<ImportLimits> = {
  maxBytes: 200 * 1024 * 1024,
  maxRejectShare: 0.5,
  rejectSampleRows: 1000,
  unitCheckRows: 200,
  maxRejectsKept: 10_000,
  batchRows: 5000,
  transactionTimeoutMs: 30 * 60 * 1000,
};

type Environment = Readonly<Record<string, string | undefined>>;

function positiveInteger(name: string, text: string): number {
  const value = Number(text);
  if (!Number.isInteger(value) || value <= 0) throw new Error(`${name} must be a positive whole number, got "${text}"`);
  return value;
}

function share(name: string, text: string): number {
  const value = Number(text);
  if (!Number.isFinite(value) || value < 0 || value > 1) throw new Error(`${name} must be a number from 0 to 1, got "${text}"`);
  return value;
}

/**
 * The limits of an import: DEFAULT_IMPORT_LIMITS, replaced by FOULCAST_MAX_IMPORT_BYTES,
 * FOULCAST_IMPORT_MAX_REJECT_SHARE and FOULCAST_IMPORT_TIMEOUT_MS when set, replaced by `overrides`.
 *
 * @throws Error naming the variable when an environment value is not valid
 */
export function resolveImportLimits(overrides: Partial<ImportLimits> = {}, env: Environment = process.env): ImportLimits {
  const fromEnvironment: Partial<ImportLimits> = {};
  const bytes = env.FOULCAST_MAX_IMPORT_BYTES?.trim();
  if (bytes) fromEnvironment.maxBytes = positiveInteger("FOULCAST_MAX_IMPORT_BYTES", bytes);
  const rejectShare = env.FOULCAST_IMPORT_MAX_REJECT_SHARE?.trim();
  if (rejectShare) fromEnvironment.maxRejectShare = share("FOULCAST_IMPORT_MAX_REJECT_SHARE", rejectShare);
  const timeout = env.FOULCAST_IMPORT_TIMEOUT_MS?.trim();
  if (timeout) fromEnvironment.transactionTimeoutMs = positiveInteger("FOULCAST_IMPORT_TIMEOUT_MS", timeout);
  const defined = Object.fromEntries(Object.entries(overrides).filter(([, value]) => value !== undefined)) as Partial<ImportLimits>;
  return { ...DEFAULT_IMPORT_LIMITS, ...fromEnvironment, ...defined };
}

// Options of one import, shared by the library, the CLI and the HTTP endpoint.
import type { ImportLimits } from "./import-limits";
import type { ImportOverrides } from "./read-readings-csv";

export type ImportSource = "web" | "cli" | "api";

export interface ImportOptions extends ImportOverrides {
  /**
   * Which mapping when none is given: "auto" (default) the asset's saved mapping, or canonical headers when there
   * is none or when the file's header is canonical and the saved mapping does not fit; "saved" only the saved
   * mapping; "canonical" only canonical headers.
   */
  mappingSource?: "auto" | "saved" | "canonical";
  /** Skip the wrong-unit check on the first rows. */
  trustUnits?: boolean;
  /** The size the file should have (HTTP Content-Length, file size on disk); a stream ending short of it fails. */
  expectedBytes?: number;
  /** Replace limits (file size, reject share, batch size, transaction time); see resolveImportLimits. */
  limits?: Partial<ImportLimits>;
}

// The HiGHS solver (WebAssembly) of a process, loaded once.
import highsLoader, { type Highs } from "highs";

let loading: Promise<Highs> | undefined;

/** The process-wide HiGHS instance. */
export function getHighs(): Promise<Highs> {
  loading ??= highsLoader();
  return loading;
}

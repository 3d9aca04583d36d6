import { deriveSeed, simulateExchanger, trueThresholdCrossing, type SimulationResult } from "../core/simulate";
import type { DemoAsset } from "./build-demo-asset";
import { DEMO_END_MS, DEMO_SEED, DEMO_START_MS } from "./demo-constants";
import { demoFleet } from "./demo-fleet";

export interface SimulateDemoFleetOptions {
  /** Tags to simulate; default all. */
  assets?: string[];
  /** Last sample, epoch ms; default DEMO_END_MS. */
  endMs?: number;
}

export interface DemoAssetSimulation {
  asset: DemoAsset;
  /** The asset's seed: deriveSeed(DEMO_SEED, tag). */
  seed: number;
  result: SimulationResult;
  /** trueThresholdCrossing at the last sample (may lie before it if the asset is already past its threshold). */
  trueCrossingMs: number | null;
}

/**
 * simulateDemoFleet: hourly data for the demo fleet from DEMO_START_MS, deterministic (each asset's seed is
 * derived from DEMO_SEED and its tag, so selecting assets does not change their data, and a shorter end gives
 * a prefix of the full series).
 *
 * @throws if a requested tag is not in the fleet, or endMs is before DEMO_START_MS.
 */
export function simulateDemoFleet(options: SimulateDemoFleetOptions = {}): DemoAssetSimulation[] {
  const endMs = options.endMs ?? DEMO_END_MS;
  if (!(endMs >= DEMO_START_MS)) throw new Error("simulateDemoFleet: endMs is before the demo start (2024-09-01T00:00Z)");
  const fleet = demoFleet();
  let assets = fleet.assets;
  if (options.assets !== undefined) {
    const known = new Set(assets.map((asset) => asset.spec.tag));
    const unknown = options.assets.filter((tag) => !known.has(tag));
    if (unknown.length > 0) throw new Error(`simulateDemoFleet: unknown asset tags: ${unknown.join(", ")}`);
    const wanted = new Set(options.assets);
    assets = assets.filter((asset) => wanted.has(asset.spec.tag));
  }
  return assets.map((asset) => {
    const seed = deriveSeed(DEMO_SEED, asset.spec.tag);
    const result = simulateExchanger(asset.spec, asset.plan, { start: DEMO_START_MS, end: endMs, seed });
    const lastMs = result.truth.length > 0 ? (result.truth[result.truth.length - 1]?.timeMs ?? endMs) : endMs;
    return { asset, seed, result, trueCrossingMs: trueThresholdCrossing(asset.spec, asset.plan, lastMs) };
  });
}

export { DEMO_END_MS, DEMO_SEED, DEMO_SITE, DEMO_START_MS, DEMO_UNITS } from "./demo-constants";
export { demoFleet, type DemoFleet } from "./demo-fleet";
export { simulateDemoFleet, type DemoAssetSimulation, type SimulateDemoFleetOptions } from "./simulate-demo-fleet";
export { buildDemoAsset, type DemoAsset } from "./build-demo-asset";
export { criticalFouling } from "./critical-fouling";
export type { DemoAssetDefinition } from "./demo-asset-definition";
export type { ExchangerSpec, SimulationPlan } from "../core/simulate";

import { buildDemoAsset, type DemoAsset } from "./build-demo-asset";
import { DEMO_SITE, DEMO_UNITS } from "./demo-constants";
import { CRUDE_PREHEAT_TRAIN } from "./crude-preheat-train";
import { HYDROTREATER_EXCHANGERS } from "./hydrotreater-exchangers";
import { PRODUCT_COOLERS } from "./product-coolers";

export interface DemoFleet {
  site: { name: string; timeZone: string; code: string };
  units: { code: string; name: string }[];
  assets: DemoAsset[];
}

/**
 * demoFleet: the invented demo site, its three process units and 24 exchangers with their hidden truth.
 * Pure: every call builds fresh objects from the fixed definitions.
 */
export function demoFleet(): DemoFleet {
  return {
    site: { ...DEMO_SITE },
    units: DEMO_UNITS.map((unit) => ({ ...unit })),
    assets: [...CRUDE_PREHEAT_TRAIN, ...HYDROTREATER_EXCHANGERS, ...PRODUCT_COOLERS].map(buildDemoAsset),
  };
}

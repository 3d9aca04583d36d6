export { waterSaturationPressure, WATER_CRITICAL_TEMPERATURE_K, WATER_TRIPLE_POINT_K } from "./water-saturation-pressure";
export { waterSpecificHeat } from "./water-specific-heat";

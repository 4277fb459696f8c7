/** How a user wants weights, lengths, depths and temperatures shown. Stored values keep what was entered. */
export const WEIGHT_UNITS = ['lb', 'lb-oz', 'kg'] as const;
export const LENGTH_UNITS = ['in', 'mm'] as const;
export const DEPTH_UNITS = ['ft', 'm'] as const;
export const TEMPERATURE_UNITS = ['F', 'C'] as const;
export type WeightUnit = (typeof WEIGHT_UNITS)[number];
export type LengthUnit = (typeof LENGTH_UNITS)[number];
export type DepthUnit = (typeof DEPTH_UNITS)[number];
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];

export interface UnitPreferences {
  weight: WeightUnit;
  length: LengthUnit;
  depth: DepthUnit;
  temperature: TemperatureUnit;
}

export const DEFAULT_UNITS: UnitPreferences = { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' };

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

/**
 * Sonar frequencies a find may carry, in kHz. Echo sounders for fishing and survey work run from
 * some tens of kHz to a few MHz (from memory, general underwater-acoustics knowledge: beam width
 * scales with wavelength over transducer size, so a lower frequency gives a wider cone and reaches
 * deeper, a higher one a narrower, sharper cone). 20–3000 kHz admits all of them and refuses slips
 * such as Hz typed for kHz.
 */
export const FREQUENCY_KHZ = Object.freeze({ min: 20, max: 3000 });

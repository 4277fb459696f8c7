/**
 * @shoalbook/analytics — the trade's computations as a pure library (no I/O, deterministic).
 * Every function is checked in tests against a published source or a reference library.
 */

// Statistics
export { wilsonInterval, type ProportionInterval } from './stats/wilson.js';
export { compareProportions, type SuccessCount, type ProportionComparison } from './stats/newcombe.js';
export { fisherExactTwoSided } from './stats/fisher.js';
export {
  shrinkRates,
  fitBetaPrior,
  MAX_PRIOR_STRENGTH,
  type RateGroup,
  type ShrunkRate,
  type BetaPrior,
  type GroupKey,
} from './stats/shrinkage.js';
export {
  hitRates,
  type FindInput,
  type CatchInput,
  type CatchFate,
  type HitRateGroup,
  type HitRateOptions,
  type HitRateGrouping,
  type RateSummary,
} from './stats/hit-rates.js';
export { normalQuantile, normalCdf } from './stats/special.js';

// Weigh-in
export {
  dayBag,
  dayBags,
  daySummary,
  isShortFish,
  verdictsById,
  FISH_STATES,
  type BagPenalty,
  type DayBag,
  type DayFish,
  type DayRules,
  type DaySummary,
  type EventFormat,
  type FishState,
  type FishVerdict,
  type LoggedFate,
} from './weigh-in/day-bag.js';
export { fieldStanding, ordinal, type FieldStanding } from './weigh-in/field-standing.js';
export { units, cleanLb, KG_PER_LB, MM_PER_IN, M_PER_FT, OZ_PER_LB, type PoundsOunces } from './weigh-in/units.js';

// Fish condition
export {
  standardWeightG,
  STANDARD_WEIGHT_EQUATIONS,
  type BassSpecies,
  type StandardWeightEquation,
} from './condition/standard-weight.js';
export {
  relativeWeight,
  weightLooksWrong,
  DEFAULT_PLAUSIBLE_RELATIVE_WEIGHT,
  type PlausibleRelativeWeight,
} from './condition/relative-weight.js';

// Sun and moon
export { sunMoonDay, type SunMoonDay } from './sky/sun-moon-day.js';
export { solunarPeriodAt, type SolunarPeriod, type SolunarOptions, type SolunarMarker } from './sky/solunar.js';

// Geometry and sonar
export { distanceM, MEAN_EARTH_RADIUS_M, type LatLon } from './geo/distance.js';
export { nearestFind, type NearestFind } from './geo/nearest-find.js';
export { beamFootprintM, doubleEchoDepth, coverage, SQ_FT_PER_ACRE, FT_PER_MILE } from './geo/sonar.js';
export {
  depthBand,
  temperatureBand,
  depthBandLabels,
  temperatureBandLabels,
  DEFAULT_DEPTH_BAND_EDGES_FT,
  DEFAULT_TEMPERATURE_BAND_EDGES_F,
} from './geo/bands.js';

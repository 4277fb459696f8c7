/**
 * Shoalbook's own small taxonomy of the kinds of place an angler marks in practice.
 * The sub-kinds are the trade's everyday words for bottom and cover types.
 */
export const FIND_KINDS = ['hard-bottom', 'vegetation', 'bait', 'wood-brush', 'contour', 'man-made', 'other'] as const;
export type FindKind = (typeof FIND_KINDS)[number];

export const FIND_SUB_KINDS: Record<FindKind, readonly string[]> = {
  'hard-bottom': ['shell', 'rock', 'gravel', 'clay', 'sand'],
  vegetation: ['eelgrass', 'hydrilla', 'milfoil', 'coontail', 'pondweed', 'mixed'],
  bait: ['shad school', 'scattered bait'],
  'wood-brush': ['brush pile', 'standing timber', 'laydown', 'stump field'],
  contour: ['point', 'ledge', 'hump', 'channel swing', 'saddle'],
  'man-made': ['bridge', 'riprap', 'dock', 'road bed', 'fish attractor'],
  other: ['other'],
};

/** Labels in our own words, for screens and reports. */
export const FIND_KIND_LABELS: Record<FindKind, string> = {
  'hard-bottom': 'Hard bottom',
  vegetation: 'Vegetation',
  bait: 'Bait',
  'wood-brush': 'Wood / brush',
  contour: 'Contour',
  'man-made': 'Man-made',
  other: 'Other',
};

/** How the angler came upon the find. */
export const FOUND_HOW = ['on-plane', 'idling', 'visual', 'partner'] as const;
export type FoundHow = (typeof FOUND_HOW)[number];
export const FOUND_HOW_LABELS: Record<FoundHow, string> = {
  'on-plane': 'Running on plane',
  idling: 'Idling',
  visual: 'Seen from the boat',
  partner: 'From a partner',
};

/** Vegetation density as the angler judged it. */
export const VEGETATION_DENSITIES = ['none', 'sparse', 'moderate', 'dense'] as const;
export type VegetationDensity = (typeof VEGETATION_DENSITIES)[number];

export const SPECIES = ['largemouth', 'smallmouth', 'spotted', 'other'] as const;
export type Species = (typeof SPECIES)[number];
export const SPECIES_LABELS: Record<Species, string> = {
  largemouth: 'Largemouth',
  smallmouth: 'Smallmouth',
  spotted: 'Spotted',
  other: 'Other',
};

/** What became of a fish: brought to the scales, culled for a bigger one, released at once, or dead. */
export const FATES = ['weighed', 'culled', 'released', 'dead'] as const;
export type Fate = (typeof FATES)[number];

/** What the day's bag rule (analytics dayBag) made of a fish; labelled on screen exactly as below. */
export const FISH_STATES = ['counted', 'culled', 'released', 'short', 'dead'] as const;
export type FishState = (typeof FISH_STATES)[number];
export const FISH_STATE_LABELS: Record<FishState, string> = {
  counted: 'Counted',
  culled: 'Culled',
  released: 'Released',
  short: 'Short fish',
  dead: 'Dead fish',
};

/** Team: one bag per boat from both anglers' fish. Individual: a bag per angler. The event's own rules. */
export const EVENT_FORMATS = ['team', 'individual'] as const;
export type EventFormat = (typeof EVENT_FORMATS)[number];

/** Hardness grade 1 (soft: faint, fuzzy double echo) … 5 (very hard: strong, sharp double echo). */
export const HARDNESS_GRADES = [1, 2, 3, 4, 5] as const;
export type HardnessGrade = (typeof HARDNESS_GRADES)[number];

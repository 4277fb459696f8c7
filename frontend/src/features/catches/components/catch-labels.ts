import type { Fate } from '@shoalbook/shared';

export const FATE_LABELS: Record<Fate, string> = {
  weighed: 'Kept for the scales',
  culled: 'Culled (swapped out)',
  released: 'Released',
  dead: 'Dead',
};

export const FATE_SHORT: Record<Fate, string> = {
  weighed: 'Kept',
  culled: 'Culled',
  released: 'Released',
  dead: 'Dead',
};

import { FISH_STATE_LABELS, type BagFishVerdict, type FishState } from '@shoalbook/shared';
import { Label } from '@primer/react';

const VARIANT: Record<FishState, 'success' | 'secondary' | 'attention' | 'danger'> = {
  counted: 'success',
  culled: 'secondary',
  released: 'secondary',
  short: 'attention',
  dead: 'danger',
};

/** The state the bag rule gave a fish, labelled exactly: counted, culled, released, short fish, dead fish. */
export function FishStateLabel({ verdict }: { verdict: BagFishVerdict | undefined }) {
  if (!verdict) return null;
  const text =
    verdict.state === 'dead' ? (verdict.counted ? 'Dead fish, counted' : 'Dead fish, not counted') : FISH_STATE_LABELS[verdict.state];
  return <Label variant={VARIANT[verdict.state]}>{text}</Label>;
}

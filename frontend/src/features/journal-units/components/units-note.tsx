import type { UnitPreferences } from '@shoalbook/shared';
import { Link as PrimerLink, Text } from '@primer/react';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { UNIT_SIGNS } from '../../../lib/units';

const WEIGHT_WORDS = { lb: 'pounds and hundredths', 'lb-oz': 'pounds–ounces', kg: 'kilograms' } as const;

/** One line saying which units the screen shows and takes, with the way to change them. */
export function UnitsNote({ prefs }: { prefs: UnitPreferences }) {
  return (
    <Text as="p" size="small" style={{ color: 'var(--fgColor-muted)', margin: 0 }}>
      Shown and entered in {WEIGHT_WORDS[prefs.weight]}, {UNIT_SIGNS[prefs.length]}, {UNIT_SIGNS[prefs.depth]} and {UNIT_SIGNS[prefs.temperature]}.{' '}
      <PrimerLink as={Link} to={paths.account.href()}>
        Change units
      </PrimerLink>
    </Text>
  );
}

import type { UnitPreferences } from '@shoalbook/shared';
import { Link as PrimerLink, Text } from '@primer/react';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { UNIT_SIGNS } from '../../../lib/units';
import styles from './units-note.module.css';

const WEIGHT_WORDS = { lb: 'pounds and hundredths', 'lb-oz': 'pounds–ounces', kg: 'kilograms' } as const;

/** One line saying which units the screen shows and takes, with the way to change them. */
export function UnitsNote({ prefs }: { prefs: UnitPreferences }) {
  return (
    <Text as="p" size="small" className={styles.note}>
      Shown and entered in {WEIGHT_WORDS[prefs.weight]}, {UNIT_SIGNS[prefs.length]}, {UNIT_SIGNS[prefs.depth]} and{' '}
      {UNIT_SIGNS[prefs.temperature]}.{' '}
      <PrimerLink as={Link} to={paths.account.href()} inline className={styles.link}>
        Change units
      </PrimerLink>
    </Text>
  );
}

import type { ReactNode } from 'react';
import '@primer/primitives/dist/css/functional/themes/light-high-contrast.css';
import '@primer/primitives/dist/css/functional/themes/dark-high-contrast.css';
import { useColorMode } from '../../lib/color-mode';
import { useNarrowScreen } from '../../lib/narrow-screen';
import styles from './sunlight-theme.module.css';

/**
 * On a phone, the entry screens in Primer's high-contrast themes (light or dark as the device is set), so the
 * text reads in sunlight: at least 7:1 against its background (WCAG 2.2 SC 1.4.6 Contrast (Enhanced)).
 * Wider screens keep the usual theme.
 */
export function SunlightTheme({ children }: { children: ReactNode }) {
  const colorMode = useColorMode();
  const narrow = useNarrowScreen();
  // One element either way, so turning the phone does not remount (and empty) the forms inside.
  return (
    <div
      className={narrow ? styles.sunlight : undefined}
      data-color-mode={narrow ? colorMode : undefined}
      data-light-theme={narrow ? 'light_high_contrast' : undefined}
      data-dark-theme={narrow ? 'dark_high_contrast' : undefined}
    >
      {children}
    </div>
  );
}

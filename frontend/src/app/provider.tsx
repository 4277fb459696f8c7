import { BaseStyles } from '@primer/react';
import { ThemeProvider } from '@primer/react/next';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { useColorMode } from '../lib/color-mode';

/** Primer's theme (light or dark as chosen on this device, our accents on top), base styles and the query cache. */
export function AppProvider({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  const colorMode = useColorMode();
  return (
    <ThemeProvider colorMode={colorMode} dayScheme="light" nightScheme="dark">
      {/* Inline links are underlined, so they never rely on colour alone (WCAG 1.4.1). */}
      <BaseStyles className="sb-root" data-a11y-link-underlines="true">
        <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
      </BaseStyles>
    </ThemeProvider>
  );
}

import { BaseStyles } from '@primer/react';
import { ThemeProvider } from '@primer/react/next';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';

/** Primer's theme (light, our accents on top), base styles and the query cache, around the whole app. */
export function AppProvider({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  return (
    <ThemeProvider colorMode="light">
      {/* Inline links are underlined, so they never rely on colour alone (WCAG 1.4.1). */}
      <BaseStyles className="sb-root" data-a11y-link-underlines="true">
        <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
      </BaseStyles>
    </ThemeProvider>
  );
}

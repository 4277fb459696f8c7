import { LinkButton } from '@primer/react';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { EmptyState } from '../../../components/feedback/query-states';

/** An empty report: says what to enter in the journal for it to fill, with a link there. */
export function ReportEmpty({
  title,
  children,
  to,
  action,
}: {
  title: string;
  children: ReactNode;
  to?: string;
  action?: string;
}) {
  return (
    <EmptyState
      title={title}
      action={
        to && action ? (
          <LinkButton as={RouterLink} to={to}>
            {action}
          </LinkButton>
        ) : undefined
      }
    >
      {children}
    </EmptyState>
  );
}

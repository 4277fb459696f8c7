import type { CrewView } from '@shoalbook/shared';
import { Banner, Label, LinkButton, UnderlineNav } from '@primer/react';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { Link as RouterLink, Outlet, useLocation, useOutletContext, useParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../../components/feedback/query-states';
import { paths } from '../../../../config/paths';
import { crewQuery } from '../../../../features/crews/api/crews-api';
import { eventsQuery } from '../../../../features/events';
import { lakesQuery } from '../../../../features/lakes';
import { isApiError } from '../../../../lib/api-client';
import { forgetCrew } from '../../../../lib/crew-cache';
import { ROLE_LABELS } from '../../../../lib/authorization';
import { CREW_SECTIONS } from './crew-sections';
import styles from './crew.module.css';

/** What every crew section receives from the layout. */
export interface CrewOutletContext {
  crew: CrewView;
}

/** The crew sections read the loaded crew from here. */
export function useCrew(): CrewView {
  return useOutletContext<CrewOutletContext>().crew;
}

/** /crews/:crewId/*: loads the crew (404 for non-members) and shows its name and section tabs. */
export function Component() {
  const { crewId = '' } = useParams();
  const { pathname } = useLocation();
  const crew = useQuery(crewQuery(crewId));
  const queryClient = useQueryClient();
  const notAMember = crew.isError && isApiError(crew.error, 404);
  // Removed from the crew (or it was deleted): what this device kept of its journal goes too.
  useEffect(() => {
    if (notAMember) void forgetCrew(queryClient, crewId);
  }, [notAMember, queryClient, crewId]);
  // Opened with signal (at the ramp, say): the crew's lakes and events are read and kept on the phone, so the
  // find and catch forms open later without signal even on a screen not opened before.
  const opened = crew.isSuccess;
  useEffect(() => {
    if (!opened) return;
    void queryClient.prefetchQuery(lakesQuery(crewId));
    void queryClient.prefetchQuery(eventsQuery(crewId));
  }, [opened, queryClient, crewId]);

  if (crew.isPending) return <LoadingState label="Opening the crew…" />;
  if (crew.isError) {
    if (notAMember) {
      return (
        <Banner
          variant="warning"
          title="This crew is not open to you"
          description="Either it does not exist or you are not one of its members. Crews are private to their members."
          primaryAction={
            <LinkButton as={RouterLink} to={paths.home.href()}>
              Go to your crews
            </LinkButton>
          }
        />
      );
    }
    return <ErrorState error={crew.error} title="The crew could not be loaded" onRetry={() => void crew.refetch()} />;
  }

  const sections = CREW_SECTIONS.filter((s) => !s.roles || s.roles.includes(crew.data.role));
  return (
    <>
      <div className={styles.crewHeader}>
        <p className={styles.kicker}>Crew</p>
        <div className={styles.crewTitleRow}>
          <h1 className={styles.crewName}>{crew.data.name}</h1>
          <Label variant={crew.data.role === 'viewer' ? 'secondary' : 'accent'} size="large">
            You: {ROLE_LABELS[crew.data.role]}
          </Label>
        </div>
      </div>
      <UnderlineNav aria-label="Crew sections" className={styles.sectionNav}>
        {sections.map((section) => {
          const href = section.href(crew.data.id);
          const current = section.end ? pathname === href : pathname.startsWith(href);
          return (
            <UnderlineNav.Item
              key={section.id}
              as={RouterLink}
              to={href}
              leadingVisual={<section.icon />}
              aria-current={current ? 'page' : undefined}
            >
              {section.label}
            </UnderlineNav.Item>
          );
        })}
      </UnderlineNav>
      <div className={styles.sectionBody}>
        <Outlet context={{ crew: crew.data } satisfies CrewOutletContext} />
      </div>
    </>
  );
}

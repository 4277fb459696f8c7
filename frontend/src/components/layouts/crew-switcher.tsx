import { ActionList, ActionMenu } from '@primer/react';
import { PlusIcon, PeopleIcon } from '@primer/octicons-react';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../config/paths';
import { ROLE_LABELS } from '../../lib/authorization';
import type { CrewRole } from '@shoalbook/shared';

export interface CrewChoice {
  id: string;
  name: string;
  role: CrewRole;
}

/** Lists the person's crews and switches between them; "Start a crew" sits at the end. */
export function CrewSwitcher({ crews, currentCrewId }: { crews: CrewChoice[]; currentCrewId?: string }) {
  const current = crews.find((c) => c.id === currentCrewId);
  return (
    <ActionMenu>
      <ActionMenu.Button
        leadingVisual={PeopleIcon}
        aria-label={current ? `${current.name}: switch crew` : 'Crews: choose a crew'}
      >
        {current ? current.name : 'Crews'}
      </ActionMenu.Button>
      <ActionMenu.Overlay width="medium">
        <ActionList>
          <ActionList.Group>
            <ActionList.GroupHeading>Your crews</ActionList.GroupHeading>
            {crews.length === 0 ? (
              <ActionList.Item disabled>You are in no crew yet</ActionList.Item>
            ) : (
              crews.map((crew) => (
                <ActionList.LinkItem
                  key={crew.id}
                  as={RouterLink}
                  to={paths.crew.href(crew.id)}
                  active={crew.id === currentCrewId}
                  aria-current={crew.id === currentCrewId ? 'page' : undefined}
                >
                  {crew.name}
                  <ActionList.Description>{ROLE_LABELS[crew.role]}</ActionList.Description>
                </ActionList.LinkItem>
              ))
            )}
          </ActionList.Group>
          <ActionList.Divider />
          <ActionList.LinkItem as={RouterLink} to={paths.newCrew.href()}>
            <ActionList.LeadingVisual>
              <PlusIcon />
            </ActionList.LeadingVisual>
            Start a crew
          </ActionList.LinkItem>
        </ActionList>
      </ActionMenu.Overlay>
    </ActionMenu>
  );
}

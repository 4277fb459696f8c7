import { ActionList, ActionMenu } from '@primer/react';
import { PersonIcon, SignOutIcon } from '@primer/octicons-react';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../config/paths';

/** The signed-in person's menu: their account page and sign-out. */
export function AccountMenu({
  displayName,
  email,
  onSignOut,
}: {
  displayName: string;
  email: string;
  onSignOut: () => void;
}) {
  return (
    <ActionMenu>
      <ActionMenu.Button leadingVisual={PersonIcon} aria-label={`Account menu for ${displayName}`}>
        <span data-account-name>{displayName}</span>
      </ActionMenu.Button>
      <ActionMenu.Overlay align="end" width="medium">
        <ActionList>
          <ActionList.Group>
            <ActionList.GroupHeading>Signed in as {email}</ActionList.GroupHeading>
            <ActionList.LinkItem as={RouterLink} to={paths.account.href()}>
              Account, units and password
            </ActionList.LinkItem>
          </ActionList.Group>
          <ActionList.Divider />
          <ActionList.Item onSelect={onSignOut}>
            <ActionList.LeadingVisual>
              <SignOutIcon />
            </ActionList.LeadingVisual>
            Sign out
          </ActionList.Item>
        </ActionList>
      </ActionMenu.Overlay>
    </ActionMenu>
  );
}

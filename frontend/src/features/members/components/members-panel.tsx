import type { CrewRole, InviteView, MemberView } from '@shoalbook/shared';
import { ConfirmationDialog, Heading, Text } from '@primer/react';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback, useState } from 'react';
import { EmptyState, ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { FormError } from '../../../components/form/form-error';
import { changeMemberRole, invitesQuery, membersQuery, removeMember, revokeInvite } from '../api/members-api';
import { HandOverForm } from './hand-over-form';
import { InviteForm } from './invite-form';
import { MembersTable } from './members-table';
import { PendingInvites } from './pending-invites';
import styles from './members-panel.module.css';

/** Members, and for owners the pending invites and the invite form. */
export function MembersPanel({
  crewId,
  crewName,
  ownUserId,
  canManage,
  onLeft,
}: {
  crewId: string;
  crewName: string;
  ownUserId: string;
  canManage: boolean;
  /** After the owner handed the crew over and left it. */
  onLeft: () => void;
}) {
  const queryClient = useQueryClient();
  const members = useQuery(membersQuery(crewId));
  const [toRemove, setToRemove] = useState<MemberView | null>(null);

  const roleChange = useMutation({
    mutationFn: ({ member, role }: { member: MemberView; role: CrewRole }) =>
      changeMemberRole(crewId, member.userId, role),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['crews', crewId, 'members'] }),
    onSuccess: (_updated, { member }) => {
      // The caller's own role in the crew may have changed.
      if (member.userId === ownUserId) {
        void queryClient.invalidateQueries({ queryKey: ['crews'] });
        void queryClient.invalidateQueries({ queryKey: ['me'] });
      }
    },
  });
  const removal = useMutation({
    mutationFn: (member: MemberView) => removeMember(crewId, member.userId),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['crews', crewId, 'members'] }),
  });
  const onChangeRole = useCallback(
    (member: MemberView, role: CrewRole) => roleChange.mutate({ member, role }),
    [roleChange],
  );
  const onRemove = useCallback((member: MemberView) => setToRemove(member), []);
  const busyUserId = roleChange.isPending
    ? roleChange.variables?.member.userId
    : removal.isPending
      ? removal.variables?.userId
      : null;

  return (
    <div className={styles.panel}>
      <section aria-labelledby="members-heading" className={styles.section}>
        <Heading as="h2" id="members-heading" variant="medium">
          Members
        </Heading>
        <FormError error={roleChange.error} title="The role was not changed" />
        <FormError error={removal.error} title="The member was not removed" />
        {members.isPending ? (
          <LoadingState label="Loading members…" />
        ) : members.isError ? (
          <ErrorState
            error={members.error}
            title="Members could not be loaded"
            onRetry={() => void members.refetch()}
          />
        ) : members.data.length === 0 ? (
          <EmptyState title="No members yet" />
        ) : (
          <MembersTable
            members={members.data}
            ownUserId={ownUserId}
            canManage={canManage}
            busyUserId={busyUserId}
            onChangeRole={onChangeRole}
            onRemove={onRemove}
          />
        )}
      </section>

      {canManage ? <InvitesSection crewId={crewId} /> : null}

      {canManage && members.data ? (
        <section aria-labelledby="hand-over-heading" className={styles.section}>
          <Heading as="h2" id="hand-over-heading" variant="medium">
            Hand the crew over
          </Heading>
          <Text as="p" className={styles.lead}>
            Give the crew to another member in one step, when you stop running it: the journal, members and invites go
            with it.
          </Text>
          <HandOverForm
            crewId={crewId}
            crewName={crewName}
            ownUserId={ownUserId}
            members={members.data}
            onLeft={onLeft}
          />
        </section>
      ) : null}

      {toRemove ? (
        <ConfirmationDialog
          title={`Remove ${toRemove.displayName}?`}
          confirmButtonContent="Remove from crew"
          confirmButtonType="danger"
          onClose={(gesture) => {
            const member = toRemove;
            setToRemove(null);
            if (gesture === 'confirm') removal.mutate(member);
          }}
        >
          {toRemove.displayName} ({toRemove.email}) will lose access to the crew&rsquo;s journal at once. You can invite
          them again later.
        </ConfirmationDialog>
      ) : null}
    </div>
  );
}

function InvitesSection({ crewId }: { crewId: string }) {
  const queryClient = useQueryClient();
  const invites = useQuery(invitesQuery(crewId));
  const revoke = useMutation({
    mutationFn: (invite: InviteView) => revokeInvite(crewId, invite.id),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['crews', crewId, 'invites'] }),
  });
  return (
    <>
      <section aria-labelledby="invite-heading" className={styles.section}>
        <Heading as="h2" id="invite-heading" variant="medium">
          Invite someone
        </Heading>
        <Text as="p" className={styles.lead}>
          Your partner or co-angler as an angler; a coach or sponsor as a viewer. The link in the e-mail works once and
          expires after seven days.
        </Text>
        <InviteForm crewId={crewId} />
      </section>
      <section aria-labelledby="pending-heading" className={styles.section}>
        <Heading as="h2" id="pending-heading" variant="medium">
          Pending invites
        </Heading>
        <FormError error={revoke.error} title="The invite was not revoked" />
        {invites.isPending ? (
          <LoadingState label="Loading invites…" />
        ) : invites.isError ? (
          <ErrorState
            error={invites.error}
            title="Invites could not be loaded"
            onRetry={() => void invites.refetch()}
          />
        ) : invites.data.length === 0 ? (
          <EmptyState title="No invites waiting">Invites you send appear here until they are accepted.</EmptyState>
        ) : (
          <PendingInvites
            invites={invites.data}
            busyInviteId={revoke.isPending ? revoke.variables?.id : null}
            onRevoke={(invite) => revoke.mutate(invite)}
          />
        )}
      </section>
    </>
  );
}

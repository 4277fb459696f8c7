import type { MeResponse } from '@shoalbook/shared';
import { Banner, Button, Heading, Link, LinkButton, Text } from '@primer/react';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Link as RouterLink } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { FormError } from '../../../components/form/form-error';
import { paths } from '../../../config/paths';
import { isApiError } from '../../../lib/api-client';
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from '../../../lib/authorization';
import { acceptInvite, invitePreviewQuery } from '../api/invites-api';
import styles from './accept-invite.module.css';

const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'long' });

/**
 * What an invite link offers and, once the person is signed in, the button that accepts it.
 * `me` is null when nobody is signed in: the person signs in or up first and comes back here.
 */
export function AcceptInvite({
  token,
  me,
  onAccepted,
}: {
  token: string;
  me: MeResponse | null;
  onAccepted: (crewId: string) => void;
}) {
  const queryClient = useQueryClient();
  const preview = useQuery(invitePreviewQuery(token));
  const accept = useMutation({
    mutationFn: () => acceptInvite(token),
    onSuccess: async ({ crewId }) => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: ['crews'] }),
        queryClient.invalidateQueries({ queryKey: ['me'] }),
      ]);
      onAccepted(crewId);
    },
  });

  if (preview.isPending) return <LoadingState label="Opening the invite…" />;
  if (preview.isError) {
    if (isApiError(preview.error, 404)) {
      return (
        <Banner
          variant="warning"
          title="This invite link no longer works"
          description="It may have been used already, revoked, or it expired. Ask the crew's owner to send a new one."
        />
      );
    }
    return (
      <ErrorState error={preview.error} title="The invite could not be opened" onRetry={() => void preview.refetch()} />
    );
  }

  const invite = preview.data;
  const here = paths.invite.href(token);
  const otherAddress = me && me.user.email.toLowerCase() !== invite.email.toLowerCase();

  return (
    <div className={styles.card}>
      <Text as="p" className={styles.kicker}>
        You are invited to join
      </Text>
      <Heading as="h2" className={styles.crewName}>
        {invite.crewName}
      </Heading>
      <Text as="p">
        as <Text weight="semibold">{ROLE_LABELS[invite.role].toLowerCase()}</Text>: {ROLE_DESCRIPTIONS[invite.role]}
      </Text>
      <Text as="p" size="small" className={styles.meta}>
        Sent to {invite.email} · the link works until {dateFormat.format(new Date(invite.expiresAt))}
      </Text>

      {me ? (
        <>
          {otherAddress ? (
            <Banner
              variant="info"
              layout="compact"
              title="Signed in with another address"
              description={`You are signed in as ${me.user.email}. Accepting adds that account to the crew.`}
            />
          ) : null}
          <FormError error={accept.error} title="Could not join the crew" />
          <Button variant="primary" size="large" block loading={accept.isPending} onClick={() => accept.mutate()}>
            Join {invite.crewName}
          </Button>
        </>
      ) : (
        <div className={styles.signedOut}>
          <Text as="p">Sign in or create an account first; you will come straight back here to accept.</Text>
          <LinkButton as={RouterLink} to={paths.signUp.href(here, invite.email)} variant="primary" size="large" block>
            Create an account
          </LinkButton>
          <Text as="p" className={styles.alt}>
            Already have one?{' '}
            <Link as={RouterLink} to={paths.signIn.href(here)} inline>
              Sign in to accept
            </Link>
          </Text>
        </div>
      )}
    </div>
  );
}

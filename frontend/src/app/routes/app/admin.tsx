import { Banner, ConfirmationDialog } from '@primer/react';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback, useState } from 'react';
import { EmptyState, ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { FormError } from '../../../components/form/form-error';
import { PageHeader } from '../../../components/layouts/page-header';
import { accountsQuery, updateAccountStatus, type AdminAccountRow } from '../../../features/admin/api/admin-api';
import { AccountsTable } from '../../../features/admin/components/accounts-table';
import { useSignedInMe } from '../../../lib/auth';

/** /admin: site admins see every account and can disable or enable it. Being admin opens no crew. */
export function Component() {
  const me = useSignedInMe();
  if (me.user.siteRole !== 'admin') {
    return (
      <>
        <PageHeader title="Accounts" />
        <Banner
          variant="warning"
          title="For site administrators only"
          description="Your account cannot manage other accounts."
        />
      </>
    );
  }
  return <AccountsAdmin ownUserId={me.user.id} />;
}

function AccountsAdmin({ ownUserId }: { ownUserId: string }) {
  const queryClient = useQueryClient();
  const accounts = useQuery(accountsQuery);
  const [toDisable, setToDisable] = useState<AdminAccountRow | null>(null);
  const toggle = useMutation({
    mutationFn: (account: AdminAccountRow) => updateAccountStatus(account.id, { disabled: !account.disabled }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: accountsQuery.queryKey }),
  });
  const onToggle = useCallback(
    (account: AdminAccountRow) => (account.disabled ? toggle.mutate(account) : setToDisable(account)),
    [toggle],
  );

  return (
    <>
      <PageHeader
        title="Accounts"
        lead="Everyone with a Shoalbook account. Disabling an account signs it out everywhere and keeps it from signing in; its crews keep their journals."
      />
      <FormError error={toggle.error} title="The account was not changed" />
      {accounts.isPending ? (
        <LoadingState label="Loading accounts…" />
      ) : accounts.isError ? (
        <ErrorState
          error={accounts.error}
          title="Accounts could not be loaded"
          onRetry={() => void accounts.refetch()}
        />
      ) : accounts.data.length === 0 ? (
        <EmptyState title="No accounts yet" />
      ) : (
        <AccountsTable
          accounts={accounts.data}
          ownUserId={ownUserId}
          busyUserId={toggle.isPending ? toggle.variables?.id : null}
          onToggleDisabled={onToggle}
        />
      )}
      {toDisable ? (
        <ConfirmationDialog
          title={`Disable ${toDisable.email}?`}
          confirmButtonContent="Disable account"
          confirmButtonType="danger"
          onClose={(gesture) => {
            const account = toDisable;
            setToDisable(null);
            if (gesture === 'confirm') toggle.mutate(account);
          }}
        >
          {toDisable.displayName} will be signed out at once and cannot sign in until the account is enabled again.
        </ConfirmationDialog>
      ) : null}
    </>
  );
}

import type { SiteRole } from '@shoalbook/shared';
import { SearchIcon } from '@primer/octicons-react';
import { Banner, Button, ConfirmationDialog, FormControl, Text, TextInput } from '@primer/react';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback, useDeferredValue, useState } from 'react';
import { EmptyState, ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { FormError } from '../../../components/form/form-error';
import { PageHeader } from '../../../components/layouts/page-header';
import {
  ACCOUNTS_PAGE,
  accountsQuery,
  updateAccountStatus,
  type AdminAccountRow,
} from '../../../features/admin/api/admin-api';
import { AccountsTable } from '../../../features/admin/components/accounts-table';
import { useSignedInMe } from '../../../lib/auth';
import styles from './admin.module.css';

/** /admin: site admins find accounts, disable or enable them and give or take the admin role. Being admin opens no crew. */
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

type Change = { account: AdminAccountRow; disabled?: boolean; siteRole?: SiteRole };

function AccountsAdmin({ ownUserId }: { ownUserId: string }) {
  const queryClient = useQueryClient();
  const [search, setSearch] = useState('');
  const q = useDeferredValue(search);
  const [offset, setOffset] = useState(0);
  const accounts = useQuery(accountsQuery(q, offset));
  const [toConfirm, setToConfirm] = useState<Change | null>(null);
  const change = useMutation({
    mutationFn: ({ account, ...body }: Change) => updateAccountStatus(account.id, body),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['admin', 'users'] }),
  });
  // Disabling and granting admin ask first; enabling and taking admin away are undone as easily.
  const onToggle = useCallback(
    (account: AdminAccountRow) =>
      account.disabled ? change.mutate({ account, disabled: false }) : setToConfirm({ account, disabled: true }),
    [change],
  );
  const onChangeSiteRole = useCallback(
    (account: AdminAccountRow, siteRole: SiteRole) =>
      siteRole === 'admin' ? setToConfirm({ account, siteRole }) : change.mutate({ account, siteRole }),
    [change],
  );
  const total = accounts.data?.total ?? 0;
  const shown = accounts.data?.items.length ?? 0;

  return (
    <>
      <PageHeader
        title="Accounts"
        lead="Everyone with a Shoalbook account, newest first. Disabling an account signs it out everywhere and keeps it from signing in; its crews keep their journals."
      />
      <FormControl className={styles.search}>
        <FormControl.Label>Search accounts</FormControl.Label>
        <TextInput
          leadingVisual={SearchIcon}
          placeholder="Part of an e-mail address or a name"
          value={search}
          onChange={(e) => {
            setSearch(e.target.value);
            setOffset(0);
          }}
          block
        />
      </FormControl>
      <FormError error={change.error} title="The account was not changed" />
      {accounts.isPending ? (
        <LoadingState label="Loading accounts…" />
      ) : accounts.isError ? (
        <ErrorState
          error={accounts.error}
          title="Accounts could not be loaded"
          onRetry={() => void accounts.refetch()}
        />
      ) : accounts.data.items.length === 0 ? (
        <EmptyState title={q.trim() ? `No account matches “${q.trim()}”` : 'No accounts yet'} />
      ) : (
        <>
          <Text as="p" size="small" aria-live="polite" className={styles.count}>
            {`Showing ${offset + 1}–${offset + shown} of ${total} account${total === 1 ? '' : 's'}`}
          </Text>
          <AccountsTable
            accounts={accounts.data.items}
            ownUserId={ownUserId}
            busyUserId={change.isPending ? change.variables?.account.id : null}
            onToggleDisabled={onToggle}
            onChangeSiteRole={onChangeSiteRole}
          />
          {total > ACCOUNTS_PAGE ? (
            <div className={styles.pager}>
              <Button disabled={offset === 0} onClick={() => setOffset(Math.max(0, offset - ACCOUNTS_PAGE))}>
                Newer
              </Button>
              <Button disabled={offset + shown >= total} onClick={() => setOffset(offset + ACCOUNTS_PAGE)}>
                Older
              </Button>
            </div>
          ) : null}
        </>
      )}
      {toConfirm ? (
        <ConfirmationDialog
          title={
            toConfirm.disabled ? `Disable ${toConfirm.account.email}?` : `Make ${toConfirm.account.email} a site admin?`
          }
          confirmButtonContent={toConfirm.disabled ? 'Disable account' : 'Make admin'}
          confirmButtonType="danger"
          onClose={(gesture) => {
            const pending = toConfirm;
            setToConfirm(null);
            if (gesture === 'confirm') change.mutate(pending);
          }}
        >
          {toConfirm.disabled
            ? `${toConfirm.account.displayName} will be signed out at once and cannot sign in until the account is enabled again.`
            : `${toConfirm.account.displayName} will manage every account, as you do. Being admin opens no crew's journal.`}
        </ConfirmationDialog>
      ) : null}
    </>
  );
}

import { PASSWORD_MIN_LENGTH } from '@shoalbook/shared';
import { Banner, Button } from '@primer/react';
import { useMutation } from '@tanstack/react-query';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField } from '../../../components/form/text-field';
import { changePassword } from '../api/account-api';

/** Current and new password; the server ends the account's other sessions. */
export function ChangePasswordForm() {
  const [currentPassword, setCurrent] = useState('');
  const [newPassword, setNew] = useState('');
  const [repeat, setRepeat] = useState('');
  const [mismatch, setMismatch] = useState(false);
  const mutation = useMutation({
    mutationFn: changePassword,
    onSuccess: () => {
      setCurrent('');
      setNew('');
      setRepeat('');
    },
  });
  return (
    <FormStack
      label="Change password"
      onSubmit={() => {
        const differs = newPassword !== repeat;
        setMismatch(differs);
        if (!differs) mutation.mutate({ currentPassword, newPassword });
      }}
    >
      {mutation.isSuccess ? (
        <Banner
          variant="success"
          layout="compact"
          title="Password changed"
          description="Other devices were signed out."
        />
      ) : null}
      <FormError error={mutation.error} title="The password was not changed" />
      <TextField
        name="currentPassword"
        label="Current password"
        type="password"
        autoComplete="current-password"
        required
        value={currentPassword}
        onChange={(e) => setCurrent(e.target.value)}
        serverError={mutation.error}
      />
      <TextField
        name="newPassword"
        label="New password"
        type="password"
        autoComplete="new-password"
        caption={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        required
        value={newPassword}
        onChange={(e) => setNew(e.target.value)}
        serverError={mutation.error}
      />
      <TextField
        name="repeatPassword"
        label="New password, once more"
        type="password"
        autoComplete="new-password"
        required
        value={repeat}
        onChange={(e) => setRepeat(e.target.value)}
        clientError={mismatch ? 'The two passwords are not the same.' : null}
      />
      <FormActions>
        <Button type="submit" loading={mutation.isPending}>
          Change password
        </Button>
      </FormActions>
    </FormStack>
  );
}

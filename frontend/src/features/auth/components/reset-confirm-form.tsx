import { PASSWORD_MIN_LENGTH } from '@shoalbook/shared';
import { Button } from '@primer/react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField } from '../../../components/form/text-field';
import { forgetSignedIn } from '../../../lib/auth';
import { confirmPasswordReset } from '../api/auth-api';

/** The new-password form reached from the e-mailed link; every session of the account ends on success. */
export function ResetConfirmForm({ token, onDone }: { token: string; onDone: () => void }) {
  const queryClient = useQueryClient();
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [mismatch, setMismatch] = useState(false);
  const mutation = useMutation({
    mutationFn: confirmPasswordReset,
    onSuccess: () => {
      forgetSignedIn(queryClient);
      onDone();
    },
  });
  const tokenRefused = mutation.error && 'code' in mutation.error && mutation.error.code === 'token_invalid';

  return (
    <FormStack
      label="Choose a new password"
      onSubmit={() => {
        const differs = password !== repeat;
        setMismatch(differs);
        if (!differs) mutation.mutate({ token, password });
      }}
    >
      <FormError
        error={mutation.error}
        title={tokenRefused ? 'This reset link no longer works' : 'Could not change the password'}
      />
      <TextField
        name="password"
        label="New password"
        type="password"
        autoComplete="new-password"
        caption={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        required
        value={password}
        onChange={(e) => setPassword(e.target.value)}
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
        <Button type="submit" variant="primary" size="large" block loading={mutation.isPending}>
          Save new password
        </Button>
      </FormActions>
    </FormStack>
  );
}

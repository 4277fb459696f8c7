import { Banner, Button } from '@primer/react';
import { useMutation } from '@tanstack/react-query';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField } from '../../../components/form/text-field';
import { requestPasswordReset } from '../api/auth-api';

/** Asks for a reset link; the answer is the same whether or not the address has an account. */
export function ResetRequestForm() {
  const [email, setEmail] = useState('');
  const mutation = useMutation({ mutationFn: requestPasswordReset });

  if (mutation.isSuccess) {
    return (
      <Banner
        variant="success"
        title="Check your inbox"
        description={`${mutation.data.message} The link works once and expires after a while.`}
      />
    );
  }
  return (
    <FormStack label="Request a reset link" onSubmit={() => mutation.mutate(email.trim())}>
      <FormError error={mutation.error} title="Could not send the link" />
      <TextField
        name="email"
        label="E-mail of your account"
        type="email"
        autoComplete="email"
        inputMode="email"
        required
        value={email}
        onChange={(e) => setEmail(e.target.value)}
        serverError={mutation.error}
      />
      <FormActions>
        <Button type="submit" variant="primary" size="large" block loading={mutation.isPending}>
          E-mail me a reset link
        </Button>
      </FormActions>
    </FormStack>
  );
}

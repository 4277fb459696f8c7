import type { MeResponse } from '@shoalbook/shared';
import { Button } from '@primer/react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField } from '../../../components/form/text-field';
import { rememberSignedIn } from '../../../lib/auth';
import { signIn } from '../api/auth-api';

/** E-mail and password; server messages appear beside the fields they concern. */
export function SignInForm({
  onSignedIn,
  defaultEmail = '',
}: {
  onSignedIn: (me: MeResponse) => void;
  defaultEmail?: string;
}) {
  const queryClient = useQueryClient();
  const [email, setEmail] = useState(defaultEmail);
  const [password, setPassword] = useState('');
  const mutation = useMutation({
    mutationFn: signIn,
    onSuccess: (me) => {
      rememberSignedIn(queryClient, me);
      onSignedIn(me);
    },
  });

  return (
    <FormStack label="Sign in" onSubmit={() => mutation.mutate({ email: email.trim(), password })}>
      <FormError error={mutation.error} title="Could not sign in" />
      <TextField
        name="email"
        label="E-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        required
        value={email}
        onChange={(e) => setEmail(e.target.value)}
        serverError={mutation.error}
      />
      <TextField
        name="password"
        label="Password"
        type="password"
        autoComplete="current-password"
        required
        value={password}
        onChange={(e) => setPassword(e.target.value)}
        serverError={mutation.error}
      />
      <FormActions>
        <Button type="submit" variant="primary" size="large" block loading={mutation.isPending}>
          Sign in
        </Button>
      </FormActions>
    </FormStack>
  );
}

import { PASSWORD_MIN_LENGTH, type MeResponse } from '@shoalbook/shared';
import { Banner, Button } from '@primer/react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField } from '../../../components/form/text-field';
import { rememberSignedIn } from '../../../lib/auth';
import { signUp } from '../api/auth-api';

/** Name, e-mail and password for a new account; the server checks them, then the form signs the person in. */
export function SignUpForm({
  onSignedUp,
  defaultEmail = '',
}: {
  onSignedUp: (me: MeResponse) => void;
  defaultEmail?: string;
}) {
  const queryClient = useQueryClient();
  const [displayName, setDisplayName] = useState('');
  const [email, setEmail] = useState(defaultEmail);
  const [password, setPassword] = useState('');
  const mutation = useMutation({
    mutationFn: signUp,
    onSuccess: (result) => {
      if (!('signedIn' in result)) return;
      rememberSignedIn(queryClient, result.signedIn);
      onSignedUp(result.signedIn);
    },
  });

  if (mutation.data && 'checkMail' in mutation.data) {
    return <Banner variant="info" title="Check your inbox" description={mutation.data.checkMail} />;
  }

  return (
    <FormStack
      label="Create an account"
      onSubmit={() => mutation.mutate({ displayName: displayName.trim(), email: email.trim(), password })}
    >
      <FormError error={mutation.error} title="Could not create the account" />
      <TextField
        name="displayName"
        label="Your name"
        caption="How your crew will see you, e.g. on catches you log."
        autoComplete="name"
        required
        value={displayName}
        onChange={(e) => setDisplayName(e.target.value)}
        serverError={mutation.error}
      />
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
        autoComplete="new-password"
        caption={`At least ${PASSWORD_MIN_LENGTH} characters. A short sentence is easy to remember and hard to guess.`}
        required
        value={password}
        onChange={(e) => setPassword(e.target.value)}
        serverError={mutation.error}
      />
      <FormActions>
        <Button type="submit" variant="primary" size="large" block loading={mutation.isPending}>
          Create account
        </Button>
      </FormActions>
    </FormStack>
  );
}

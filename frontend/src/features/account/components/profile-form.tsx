import type { MeResponse } from '@shoalbook/shared';
import { Button, Text } from '@primer/react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField } from '../../../components/form/text-field';
import { meQuery } from '../../../lib/auth';
import { updateAccount } from '../api/account-api';

/** The name the crew sees; the e-mail is shown but changed nowhere here. */
export function ProfileForm({ me }: { me: MeResponse }) {
  const queryClient = useQueryClient();
  const [displayName, setDisplayName] = useState(me.user.displayName);
  const mutation = useMutation({
    mutationFn: (name: string) => updateAccount({ displayName: name }),
    onSuccess: (updated) => queryClient.setQueryData(meQuery.queryKey, updated),
  });
  const unchanged = displayName.trim() === me.user.displayName;
  return (
    <FormStack label="Your name" onSubmit={() => mutation.mutate(displayName.trim())}>
      <FormError error={mutation.error} title="Your name was not saved" />
      <TextField name="email" label="E-mail" value={me.user.email} readOnly caption="Your sign-in address." />
      <TextField
        name="displayName"
        label="Your name"
        autoComplete="name"
        required
        value={displayName}
        onChange={(e) => setDisplayName(e.target.value)}
        serverError={mutation.error}
      />
      <FormActions>
        <Button type="submit" variant="primary" loading={mutation.isPending} disabled={unchanged}>
          Save name
        </Button>
        {mutation.isSuccess && unchanged ? <Text role="status">Name saved.</Text> : null}
      </FormActions>
    </FormStack>
  );
}

import { CREW_ROLES, type CrewRole, type InviteView } from '@shoalbook/shared';
import { Button, FormControl, Select, Text } from '@primer/react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { fieldMessages, TextField } from '../../../components/form/text-field';
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from '../../../lib/authorization';
import { createInvite } from '../api/members-api';

/** Invite someone by e-mail with a role; they get a single-use link. */
export function InviteForm({ crewId }: { crewId: string }) {
  const queryClient = useQueryClient();
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<CrewRole>('angler');
  const [sentTo, setSentTo] = useState<string | null>(null);
  const mutation = useMutation({
    mutationFn: () => createInvite(crewId, { email: email.trim(), role }),
    onSuccess: (invite: InviteView) => {
      setSentTo(invite.email);
      setEmail('');
      void queryClient.invalidateQueries({ queryKey: ['crews', crewId, 'invites'] });
    },
  });
  const roleMessages = fieldMessages(mutation.error, 'role');

  return (
    <FormStack label="Invite someone" onSubmit={() => mutation.mutate()}>
      <FormError error={mutation.error} title="Could not send the invite" />
      <TextField
        name="email"
        label="Their e-mail"
        type="email"
        autoComplete="off"
        inputMode="email"
        required
        value={email}
        onChange={(e) => setEmail(e.target.value)}
        serverError={mutation.error}
      />
      <FormControl required>
        <FormControl.Label>Role in the crew</FormControl.Label>
        <Select name="role" block value={role} onChange={(e) => setRole(e.target.value as CrewRole)}>
          {CREW_ROLES.map((r) => (
            <Select.Option key={r} value={r}>
              {ROLE_LABELS[r]}
            </Select.Option>
          ))}
        </Select>
        <FormControl.Caption>{ROLE_DESCRIPTIONS[role]}</FormControl.Caption>
        {roleMessages.length ? (
          <FormControl.Validation variant="error">{roleMessages.join(' ')}</FormControl.Validation>
        ) : null}
      </FormControl>
      <FormActions>
        <Button type="submit" variant="primary" loading={mutation.isPending}>
          Send invite
        </Button>
        {sentTo && !mutation.isPending ? <Text role="status">Invite sent to {sentTo}.</Text> : null}
      </FormActions>
    </FormStack>
  );
}

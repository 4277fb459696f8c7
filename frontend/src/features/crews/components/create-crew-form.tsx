import type { CrewView } from '@shoalbook/shared';
import { Button } from '@primer/react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField } from '../../../components/form/text-field';
import { createCrew } from '../api/crews-api';

/** Names a new crew; whoever creates it is its owner. */
export function CreateCrewForm({ onCreated }: { onCreated: (crew: CrewView) => void }) {
  const queryClient = useQueryClient();
  const [name, setName] = useState('');
  const mutation = useMutation({
    mutationFn: createCrew,
    onSuccess: async (crew) => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: ['crews'] }),
        queryClient.invalidateQueries({ queryKey: ['me'] }),
      ]);
      onCreated(crew);
    },
  });
  return (
    <FormStack label="Start a crew" onSubmit={() => mutation.mutate({ name: name.trim() })}>
      <FormError error={mutation.error} title="Could not start the crew" />
      <TextField
        name="name"
        label="Crew name"
        caption="Anything your partner and coach will recognise, e.g. the boat's nickname."
        required
        value={name}
        onChange={(e) => setName(e.target.value)}
        serverError={mutation.error}
      />
      <FormActions>
        <Button type="submit" variant="primary" size="large" loading={mutation.isPending}>
          Start the crew
        </Button>
      </FormActions>
    </FormStack>
  );
}

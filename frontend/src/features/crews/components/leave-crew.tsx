import { Button, ConfirmationDialog, Text } from '@primer/react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { forgetCrew } from '../../../lib/crew-cache';
import { leaveCrew } from '../api/crews-api';

/** Leave the crew, after a confirmation; the server refuses when the last owner tries. */
export function LeaveCrew({
  crewId,
  crewName,
  ownUserId,
  onLeft,
}: {
  crewId: string;
  crewName: string;
  ownUserId: string;
  onLeft: () => void;
}) {
  const queryClient = useQueryClient();
  const [confirming, setConfirming] = useState(false);
  const mutation = useMutation({
    mutationFn: () => leaveCrew(crewId, ownUserId),
    onSuccess: async () => {
      queryClient.removeQueries({ queryKey: ['crews', crewId] });
      await forgetCrew(queryClient, crewId);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: ['crews'] }),
        queryClient.invalidateQueries({ queryKey: ['me'] }),
      ]);
      onLeft();
    },
  });
  return (
    <div>
      <Text as="p">Leaving removes your access to this crew&rsquo;s journal. An owner can invite you back later.</Text>
      <FormError error={mutation.error} title="Could not leave the crew" />
      <Button variant="danger" onClick={() => setConfirming(true)} loading={mutation.isPending}>
        Leave this crew
      </Button>
      {confirming ? (
        <ConfirmationDialog
          title={`Leave ${crewName}?`}
          confirmButtonContent="Leave crew"
          confirmButtonType="danger"
          onClose={(gesture) => {
            setConfirming(false);
            if (gesture === 'confirm') mutation.mutate();
          }}
        >
          You will no longer see its lakes, events, finds or catches.
        </ConfirmationDialog>
      ) : null}
    </div>
  );
}

import type { MemberView } from '@shoalbook/shared';
import { Button, ConfirmationDialog, FormControl, Select, Text } from '@primer/react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { handOverCrew, type StayAs } from '../api/members-api';
import styles from './members-panel.module.css';

const STAY_LABELS: Record<StayAs, string> = {
  angler: 'an angler (you keep logging)',
  viewer: 'a viewer (you keep reading)',
  leave: 'no member (you leave the crew)',
};

/**
 * An owner hands the crew to another member in one step: they become its owner and the one handing over steps
 * down to angler or viewer, or leaves. Asks first, naming both.
 */
export function HandOverForm({
  crewId,
  crewName,
  ownUserId,
  members,
  onLeft,
}: {
  crewId: string;
  crewName: string;
  ownUserId: string;
  members: MemberView[];
  /** After handing over and leaving: the crew is no longer the caller's. */
  onLeft: () => void;
}) {
  const queryClient = useQueryClient();
  const others = members.filter((m) => m.userId !== ownUserId);
  const [toUserId, setToUserId] = useState(others.find((m) => m.role !== 'owner')?.userId ?? others[0]?.userId ?? '');
  const [stayAs, setStayAs] = useState<StayAs>('angler');
  const [confirming, setConfirming] = useState(false);
  const handOver = useMutation({
    mutationFn: () => handOverCrew(crewId, toUserId, stayAs),
    onSuccess: () => {
      // The caller's own role changed: every crew screen reads it again.
      void queryClient.invalidateQueries({ queryKey: ['crews'] });
      void queryClient.invalidateQueries({ queryKey: ['me'] });
      if (stayAs === 'leave') onLeft();
    },
  });
  if (others.length === 0)
    return <Text as="p">Invite someone first: the crew can only be handed to one of its members.</Text>;
  const to = others.find((m) => m.userId === toUserId);
  return (
    <>
      <FormError error={handOver.error} title="The crew was not handed over" />
      <div className={styles.handOver}>
        <FormControl>
          <FormControl.Label>New owner</FormControl.Label>
          <Select value={toUserId} onChange={(e) => setToUserId(e.target.value)}>
            {others.map((m) => (
              <Select.Option key={m.userId} value={m.userId}>
                {m.displayName} ({m.email})
              </Select.Option>
            ))}
          </Select>
        </FormControl>
        <FormControl>
          <FormControl.Label>You become</FormControl.Label>
          <Select value={stayAs} onChange={(e) => setStayAs(e.target.value as StayAs)}>
            {(Object.keys(STAY_LABELS) as StayAs[]).map((s) => (
              <Select.Option key={s} value={s}>
                {STAY_LABELS[s]}
              </Select.Option>
            ))}
          </Select>
        </FormControl>
        <Button onClick={() => setConfirming(true)} disabled={!to || handOver.isPending}>
          Hand the crew over
        </Button>
      </div>
      {confirming && to ? (
        <ConfirmationDialog
          title={`Hand ${crewName} to ${to.displayName}?`}
          confirmButtonContent="Hand it over"
          confirmButtonType="danger"
          onClose={(gesture) => {
            setConfirming(false);
            if (gesture === 'confirm') handOver.mutate();
          }}
        >
          {to.displayName} becomes an owner and manages members and invites. You become {STAY_LABELS[stayAs]}. Only an
          owner can give the crew back.
        </ConfirmationDialog>
      ) : null}
    </>
  );
}

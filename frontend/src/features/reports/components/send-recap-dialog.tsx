import { MailIcon } from '@primer/octicons-react';
import { Banner, Button, Checkbox, CheckboxGroup, Dialog, FormControl, Text } from '@primer/react';
import { useState } from 'react';
import { ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { useRecapRecipients, useSendRecap } from '../api/reports-api';
import styles from './reports.module.css';

/**
 * "Send recap": an owner or angler picks crew members, and the server e-mails them the event's key numbers
 * and a link to this recap. The e-mail never carries positions of finds; the dialog says so.
 */
export function SendRecapButton({
  crewId,
  eventId,
  eventName,
  myUserId,
}: {
  crewId: string;
  eventId: string;
  eventName: string;
  myUserId?: string;
}) {
  const [open, setOpen] = useState(false);
  const [chosen, setChosen] = useState<string[]>([]);
  const members = useRecapRecipients(crewId, open);
  const send = useSendRecap(crewId, eventId);

  const close = () => {
    setOpen(false);
    send.reset();
    setChosen([]);
  };
  const toggle = (userId: string, on: boolean) =>
    setChosen((current) => (on ? [...current, userId] : current.filter((id) => id !== userId)));

  return (
    <>
      <Button leadingVisual={MailIcon} onClick={() => setOpen(true)}>
        Send recap
      </Button>
      {open ? (
        <Dialog
          title="Send this recap by e-mail"
          subtitle={eventName}
          onClose={close}
          width="large"
          footerButtons={
            send.isSuccess
              ? [{ content: 'Done', buttonType: 'primary', onClick: close }]
              : [
                  { content: 'Cancel', onClick: close },
                  {
                    content: send.isPending ? 'Sending…' : `Send to ${chosen.length || 'no one'}`,
                    buttonType: 'primary',
                    disabled: chosen.length === 0 || send.isPending,
                    onClick: () => send.mutate(chosen),
                  },
                ]
          }
        >
          <div className={styles.recipients}>
            <Text as="p">
              The e-mail carries the key numbers (bag by day, total, place, big fish, share of practice that paid off)
              and a link back to this recap. It contains no positions: no coordinates of any find or catch.
            </Text>
            {send.isSuccess ? (
              <Banner
                variant="success"
                title="Recap sent"
                description={`Sent to ${send.data.sent} ${send.data.sent === 1 ? 'member' : 'members'}.`}
              />
            ) : members.isPending ? (
              <LoadingState label="Loading the crew’s members…" />
            ) : members.isError ? (
              <ErrorState
                error={members.error}
                title="The members could not be loaded"
                onRetry={() => void members.refetch()}
              />
            ) : (
              <CheckboxGroup>
                <CheckboxGroup.Label>Send to</CheckboxGroup.Label>
                {members.data.map((member) => (
                  <FormControl key={member.userId}>
                    <Checkbox
                      value={member.userId}
                      checked={chosen.includes(member.userId)}
                      onChange={(e) => toggle(member.userId, e.target.checked)}
                    />
                    <FormControl.Label>
                      {member.displayName}
                      {member.userId === myUserId ? ' (you)' : ''}
                    </FormControl.Label>
                    <FormControl.Caption>
                      {member.email} · {member.role}
                    </FormControl.Caption>
                  </FormControl>
                ))}
              </CheckboxGroup>
            )}
            {send.isError ? <ErrorState error={send.error} title="The recap was not sent" /> : null}
          </div>
        </Dialog>
      ) : null}
    </>
  );
}

import { TrashIcon } from '@primer/octicons-react';
import { Banner, Button, Dialog, IconButton, Text } from '@primer/react';
import { useState, type ReactNode } from 'react';
import { isApiError } from '../../lib/api-client';
import styles from './journal-forms.module.css';

/** 409 codes that mean "other records still hang off this one" (journal contract: in_use, day_in_use). */
const BLOCKED_CODES = ['in_use', 'day_in_use'];

export interface DeleteRecordButtonProps {
  /** The record as people call it, with its name: `the find “Long shell flat”`. Used in the button label and the dialog title. */
  record: string;
  /** What else changes when it goes (its weigh-in is recounted, catches lose their link …). */
  consequence: ReactNode;
  /** Sends the DELETE; a rejection is shown in the dialog, which stays open. */
  onDelete: () => Promise<unknown>;
  onDeleted?: () => void;
  /** A small trash icon (in a table row) instead of a labelled button. */
  compact?: boolean;
}

/**
 * A delete button with a confirmation dialog that names the record. When the server refuses because
 * other records still use it (409 in_use / day_in_use), its sentence is shown in the dialog as it is:
 * it says what to delete first.
 */
export function DeleteRecordButton({
  record,
  consequence,
  onDelete,
  onDeleted,
  compact = false,
}: DeleteRecordButtonProps) {
  const [open, setOpen] = useState(false);
  const [pending, setPending] = useState(false);
  const [failure, setFailure] = useState<unknown>(null);
  const close = () => {
    if (pending) return;
    setOpen(false);
    setFailure(null);
  };
  const confirm = async () => {
    setPending(true);
    setFailure(null);
    try {
      await onDelete();
      setPending(false);
      setOpen(false);
      onDeleted?.();
    } catch (error) {
      setPending(false);
      setFailure(error);
    }
  };
  const blocked = BLOCKED_CODES.some((code) => isApiError(failure, 409, code));
  const label = `Delete ${record}`;
  return (
    <>
      {compact ? (
        <IconButton
          icon={TrashIcon}
          size="small"
          variant="invisible"
          aria-label={label}
          onClick={() => setOpen(true)}
        />
      ) : (
        <Button variant="danger" leadingVisual={TrashIcon} onClick={() => setOpen(true)}>
          Delete
        </Button>
      )}
      {open ? (
        <Dialog
          title={`${label}?`}
          role="alertdialog"
          onClose={close}
          footerButtons={[
            { content: blocked ? 'Close' : 'Keep it', onClick: close, autoFocus: true },
            ...(blocked
              ? []
              : [
                  {
                    content: pending ? 'Deleting…' : 'Delete',
                    buttonType: 'danger' as const,
                    onClick: confirm,
                    loading: pending,
                  },
                ]),
          ]}
        >
          <div className={styles.dialogBody}>
            {failure ? (
              <Banner
                variant={blocked ? 'warning' : 'critical'}
                layout="compact"
                title={blocked ? 'Not deleted: other records still use it' : 'Not deleted'}
                description={failure instanceof Error ? failure.message : 'Something went wrong.'}
              />
            ) : null}
            <Text as="p">{consequence}</Text>
            <Text as="p" weight="semibold">
              This cannot be undone.
            </Text>
          </div>
        </Dialog>
      ) : null}
    </>
  );
}

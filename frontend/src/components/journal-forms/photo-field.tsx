import { XIcon } from '@primer/octicons-react';
import { Button, Text } from '@primer/react';
import { useId, useRef, useState } from 'react';
import { photoProblem, photoUrl, PHOTO_RULES, uploadPhoto } from '../../lib/photos';
import styles from './journal-forms.module.css';

export interface PhotoState {
  /** Id of the stored photo to send with the record (null: none). */
  photoId: string | null;
  /** True while a chosen file is still being sent: saving waits for it. */
  busy: boolean;
}

/**
 * Choose an image for a record: it is checked here (type, 8 MB), sent to POST /photos at once, and its id
 * handed back for the record's photoId. Shows the current photo, with a way to remove it.
 */
export function PhotoField({
  crewId,
  label,
  photoId,
  onChange,
  describe,
}: {
  crewId: string;
  label: string;
  photoId: string | null;
  onChange: (state: PhotoState) => void;
  /** Alt text of the preview. */
  describe: string;
}) {
  const inputId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [status, setStatus] = useState<{ busy: boolean; error: string | null; name: string | null }>({
    busy: false,
    error: null,
    name: null,
  });

  const choose = async (file: File | undefined) => {
    if (!file) return;
    const problem = photoProblem(file);
    if (problem) {
      setStatus({ busy: false, error: problem, name: null });
      return;
    }
    setStatus({ busy: true, error: null, name: file.name });
    onChange({ photoId, busy: true });
    try {
      const { id } = await uploadPhoto(crewId, file);
      setStatus({ busy: false, error: null, name: file.name });
      onChange({ photoId: id, busy: false });
    } catch (error) {
      setStatus({
        busy: false,
        error: error instanceof Error ? error.message : 'The image could not be sent.',
        name: null,
      });
      onChange({ photoId, busy: false });
    }
  };

  const remove = () => {
    setStatus({ busy: false, error: null, name: null });
    if (inputRef.current) inputRef.current.value = '';
    onChange({ photoId: null, busy: false });
  };

  return (
    <div className={styles.photo}>
      <label htmlFor={inputId} className={styles.photoLabel}>
        {label}
      </label>
      {photoId ? (
        <div className={styles.photoCurrent}>
          <img src={photoUrl(crewId, photoId)} alt={describe} className={styles.thumb} />
          <Button size="small" leadingVisual={XIcon} onClick={remove}>
            Remove photo
          </Button>
        </div>
      ) : null}
      <input
        ref={inputRef}
        id={inputId}
        type="file"
        accept="image/*"
        className={styles.file}
        aria-describedby={`${inputId}-rules`}
        onChange={(e) => choose(e.target.files?.[0])}
      />
      <Text as="p" size="small" id={`${inputId}-rules`} className={styles.muted}>
        {PHOTO_RULES}
      </Text>
      <div aria-live="polite">
        {status.busy ? <Text size="small">Sending {status.name}…</Text> : null}
        {!status.busy && photoId && status.name ? <Text size="small">Attached: {status.name}</Text> : null}
        {status.error ? (
          <Text size="small" className={styles.error}>
            {status.error}
          </Text>
        ) : null}
      </div>
    </div>
  );
}

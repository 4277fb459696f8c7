import { ProgressBar, Text } from '@primer/react';
import type { UploadProgress } from '../../../lib/upload';
import styles from './imports.module.css';

/** The bar shown while a file goes up and the server reads it. */
export function UploadProgressBar({ progress, what }: { progress: UploadProgress | null; what: string }) {
  if (!progress) return null;
  const label =
    progress.phase === 'uploading' ? `Sending ${what}: ${progress.percent}%` : `Checking ${what} on the server…`;
  return (
    <div className={styles.progress} role="status" aria-live="polite">
      <ProgressBar
        progress={progress.phase === 'uploading' ? Math.max(progress.percent * 0.9, 2) : 95}
        aria-label={label}
        aria-valuetext={label}
        barSize="default"
        animated={progress.phase === 'processing'}
      />
      <Text size="small">{label}</Text>
    </div>
  );
}

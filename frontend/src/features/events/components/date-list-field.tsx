import { PlusIcon, XIcon } from '@primer/octicons-react';
import { Button, FormControl, IconButton, TextInput } from '@primer/react';
import { useId } from 'react';
import styles from './event-form.module.css';

/** The day after an ISO date (calendar arithmetic in UTC, so no zone can shift it). */
export function nextDate(iso: string): string {
  const [y, m, d] = iso.split('-').map(Number);
  return new Date(Date.UTC(y, m - 1, d + 1)).toISOString().slice(0, 10);
}

/** A list of calendar days (practice or competition), one date input each, added one after the other. */
export function DateListField({
  label,
  caption,
  dates,
  onChange,
  messages,
  firstDefault,
}: {
  label: string;
  caption?: string;
  dates: string[];
  onChange: (dates: string[]) => void;
  messages: string[];
  /** Day offered when the list is empty. */
  firstDefault: string;
}) {
  const groupId = useId();
  return (
    <fieldset className={styles.fieldset} aria-describedby={caption ? `${groupId}-caption` : undefined}>
      <legend className={styles.legend}>{label}</legend>
      {caption ? (
        <p id={`${groupId}-caption`} className={styles.caption}>
          {caption}
        </p>
      ) : null}
      {dates.map((date, index) => (
        <div key={index} className={styles.dateRow}>
          <FormControl>
            <FormControl.Label visuallyHidden>{`${label}: day ${index + 1}`}</FormControl.Label>
            <TextInput
              type="date"
              value={date}
              onChange={(e) => onChange(dates.map((d, i) => (i === index ? e.target.value : d)))}
            />
          </FormControl>
          <IconButton
            icon={XIcon}
            aria-label={`Remove day ${index + 1} of ${label.toLowerCase()}`}
            variant="invisible"
            onClick={() => onChange(dates.filter((_, i) => i !== index))}
          />
        </div>
      ))}
      <Button
        leadingVisual={PlusIcon}
        size="small"
        onClick={() => onChange([...dates, dates.length ? nextDate(dates[dates.length - 1]) : firstDefault])}
      >
        Add a day
      </Button>
      {messages.length ? (
        <p className={styles.error} role="alert">
          {messages.join(' ')}
        </p>
      ) : null}
    </fieldset>
  );
}

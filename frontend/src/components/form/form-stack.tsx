import type { FormEvent, ReactNode } from 'react';
import styles from './form-stack.module.css';

/** A form laid out as one readable column; submission is handled by the caller (no page reload). */
export function FormStack({
  onSubmit,
  children,
  label,
}: {
  onSubmit: () => void;
  children: ReactNode;
  /** Accessible name of the form, when the page has more than one. */
  label?: string;
}) {
  return (
    <form
      className={styles.form}
      aria-label={label}
      noValidate
      onSubmit={(event: FormEvent) => {
        event.preventDefault();
        onSubmit();
      }}
    >
      {children}
    </form>
  );
}

/** The row of buttons at the end of a form. */
export function FormActions({ children }: { children: ReactNode }) {
  return <div className={styles.actions}>{children}</div>;
}

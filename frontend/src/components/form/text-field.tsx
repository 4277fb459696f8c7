import { FormControl, TextInput } from '@primer/react';
import type { ComponentPropsWithoutRef, ReactNode } from 'react';
import { ApiRequestError } from '../../lib/api-client';

type InputProps = Omit<ComponentPropsWithoutRef<'input'>, 'size' | 'name'>;

export interface TextFieldProps extends InputProps {
  /** The request field this input fills; server messages for it appear beside the input. */
  name: string;
  label: string;
  caption?: ReactNode;
  /** The last failed submission; its fieldErrors[name] are shown here. */
  serverError?: unknown;
  /** A message found before sending (e.g. passwords that differ). */
  clientError?: string | null;
}

/** A labelled text input that shows the server's validation messages for its own field. */
export function TextField({ name, label, caption, serverError, clientError, required, ...input }: TextFieldProps) {
  const messages = fieldMessages(serverError, name);
  if (clientError) messages.unshift(clientError);
  return (
    <FormControl required={required}>
      <FormControl.Label>{label}</FormControl.Label>
      <TextInput
        name={name}
        block
        size="large"
        validationStatus={messages.length ? 'error' : undefined}
        aria-invalid={messages.length ? true : undefined}
        {...input}
      />
      {caption ? <FormControl.Caption>{caption}</FormControl.Caption> : null}
      {messages.length ? <FormControl.Validation variant="error">{messages.join(' ')}</FormControl.Validation> : null}
    </FormControl>
  );
}

/** The server's messages for one field of a failed request (empty when there are none). */
export function fieldMessages(error: unknown, field: string): string[] {
  return error instanceof ApiRequestError ? [...error.messagesFor(field)] : [];
}

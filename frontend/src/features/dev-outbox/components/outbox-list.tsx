import { Heading, Text } from '@primer/react';
import type { OutboxMessage } from '../api/outbox-api';
import { LinkifiedText } from './linkified-text';
import styles from './outbox-list.module.css';

const timeFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'medium' });

/** The messages the local mail catcher received, newest first. */
export function OutboxList({ messages }: { messages: OutboxMessage[] }) {
  return (
    <ol className={styles.list} aria-label="Messages">
      {messages.map((message) => (
        <li key={message.id} className={styles.message}>
          <article aria-labelledby={`msg-${message.id}`}>
            <Heading as="h2" id={`msg-${message.id}`} className={styles.subject}>
              {message.subject || '(no subject)'}
            </Heading>
            <dl className={styles.meta}>
              <dt>To</dt>
              <dd>{message.to}</dd>
              <dt>From</dt>
              <dd>{message.from}</dd>
              <dt>Received</dt>
              <dd>{timeFormat.format(new Date(message.receivedAt))}</dd>
            </dl>
            {message.text ? (
              <pre className={styles.body}>
                <LinkifiedText text={message.text} />
              </pre>
            ) : (
              <Text as="p" className={styles.noText}>
                This message has no plain-text part; its HTML is not shown here.
              </Text>
            )}
          </article>
        </li>
      ))}
    </ol>
  );
}

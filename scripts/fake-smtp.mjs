// The local stand-in for a real mail server: accepts SMTP on loopback and keeps each message as a JSON
// file in the outbox folder, which the development-only outbox page and the tests read back.
// Usage: node scripts/fake-smtp.mjs <port> <outboxDir>
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { randomUUID } from 'node:crypto';
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';

const [port, outboxDir] = process.argv.slice(2);
if (!port || !outboxDir) {
  console.error('usage: fake-smtp.mjs <port> <outboxDir>');
  process.exit(2);
}
mkdirSync(outboxDir, { recursive: true });

const server = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS'],
  banner: 'Shoalbook local outbox',
  size: 5 * 1024 * 1024,
  onData(stream, session, done) {
    simpleParser(stream)
      .then((mail) => {
        const id = `${Date.now()}-${randomUUID()}`;
        const message = {
          id,
          receivedAt: new Date().toISOString(),
          envelopeTo: session.envelope.rcptTo.map((r) => r.address),
          from: mail.from?.text ?? '',
          to: mail.to
            ? []
                .concat(mail.to)
                .map((t) => t.text)
                .join(', ')
            : '',
          subject: mail.subject ?? '',
          text: mail.text ?? '',
          html: typeof mail.html === 'string' ? mail.html : '',
        };
        writeFileSync(join(outboxDir, `${id}.json`), JSON.stringify(message, null, 2));
        done();
      })
      .catch(done);
  },
});
server.on('error', (e) => console.error(`fake SMTP error: ${e.message}`));
server.listen(Number(port), '127.0.0.1', () =>
  console.log(`fake SMTP listening on 127.0.0.1:${port}, outbox ${outboxDir}`),
);
const stop = () => server.close(() => process.exit(0));
process.on('SIGTERM', stop);
process.on('SIGINT', stop);

import type { CrewRole } from '@shoalbook/shared';
import { escapeHtml } from './escape-html';
import { htmlLayout, type MailMessage } from './mail-message';

const ROLE_WORDS: Record<CrewRole, string> = {
  owner: 'an owner (you will manage members and the crew)',
  angler: 'an angler (you will read and add to the journal)',
  viewer: 'a viewer (you will read the journal)',
};

/** The e-mail that carries a crew invite link. */
export function inviteMail(input: {
  crewName: string;
  inviterName: string;
  role: CrewRole;
  link: string;
  expiresAt: Date;
}): MailMessage {
  const until = input.expiresAt.toUTCString();
  const text = [
    `${input.inviterName} invites you to join the crew "${input.crewName}" on Shoalbook as ${ROLE_WORDS[input.role]}.`,
    '',
    `Open this link to accept: ${input.link}`,
    '',
    `The link works once and expires on ${until}. If you did not expect this, ignore the message.`,
  ].join('\n');
  const html = htmlLayout([
    `${escapeHtml(input.inviterName)} invites you to join the crew <strong>${escapeHtml(input.crewName)}</strong> on Shoalbook as ${ROLE_WORDS[input.role]}.`,
    `<a href="${escapeHtml(input.link)}">Accept the invite</a>`,
    `The link works once and expires on ${escapeHtml(until)}. If you did not expect this, ignore the message.`,
  ]);
  return { subject: `Join ${input.crewName} on Shoalbook`, text, html };
}

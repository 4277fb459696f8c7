import { escapeHtml } from './escape-html';
import { htmlLayout, type MailMessage } from './mail-message';

/** To a new account: it exists and is ready. */
export function welcomeMail(input: { displayName: string; signInLink: string }): MailMessage {
  const lines = [
    `Hello ${input.displayName},`,
    'Your Shoalbook account is ready. Sign in with this address and the password you chose.',
    'If you did not create it, ignore this message or ask the site admin to remove the account.',
  ];
  const text = [...lines, '', `Sign in: ${input.signInLink}`].join('\n');
  const html = htmlLayout([...lines.map(escapeHtml), `<a href="${escapeHtml(input.signInLink)}">Sign in</a>`]);
  return { subject: 'Your Shoalbook account is ready', text, html };
}

/**
 * To the owner of an address someone tried to sign up with again: the sign-up answer does not tell the
 * person who typed it (no account enumeration), so the owner hears it here.
 */
export function accountExistsMail(input: { displayName: string; signInLink: string; resetLink: string }): MailMessage {
  const lines = [
    `Hello ${input.displayName},`,
    'Someone tried to create a Shoalbook account with this address, which already has one. Nothing was changed.',
    'If it was you, sign in, or set a new password if you have forgotten it. If not, you can ignore this message.',
  ];
  const text = [...lines, '', `Sign in: ${input.signInLink}`, `Set a new password: ${input.resetLink}`].join('\n');
  const html = htmlLayout([
    ...lines.map(escapeHtml),
    `<a href="${escapeHtml(input.signInLink)}">Sign in</a> · <a href="${escapeHtml(input.resetLink)}">Set a new password</a>`,
  ]);
  return { subject: 'Someone tried to sign up with your address', text, html };
}

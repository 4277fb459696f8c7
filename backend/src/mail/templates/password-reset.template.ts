import { escapeHtml } from './escape-html';
import { htmlLayout, type MailMessage } from './mail-message';

/** The e-mail with a password-reset link. */
export function passwordResetMail(input: { displayName: string; link: string; validMinutes: number }): MailMessage {
  const text = [
    `Hello ${input.displayName},`,
    '',
    `Someone asked to set a new password for your Shoalbook account. To choose one, open: ${input.link}`,
    '',
    `The link works once, for ${input.validMinutes} minutes. Setting a new password signs you out everywhere.`,
    'If you did not ask for this, ignore the message: your password stays as it is.',
  ].join('\n');
  const html = htmlLayout([
    `Hello ${escapeHtml(input.displayName)},`,
    `Someone asked to set a new password for your Shoalbook account. <a href="${escapeHtml(input.link)}">Choose a new password</a>.`,
    `The link works once, for ${input.validMinutes} minutes. Setting a new password signs you out everywhere.`,
    'If you did not ask for this, ignore the message: your password stays as it is.',
  ]);
  return { subject: 'Set a new Shoalbook password', text, html };
}

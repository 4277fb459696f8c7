/** A rendered e-mail: plain text always, with a simple HTML alternative. */
export interface MailMessage {
  subject: string;
  text: string;
  html: string;
}

/** Wrap HTML paragraphs in a minimal, inline-styled layout (mail clients ignore stylesheets). */
export function htmlLayout(paragraphs: string[]): string {
  return [
    '<!doctype html><html><body style="font-family: Georgia, serif; color: #1f2328; line-height: 1.5">',
    ...paragraphs.map((p) => `<p>${p}</p>`),
    '<p style="color: #59636e; font-size: 13px">Shoalbook — the crew journal for practice finds and weigh-ins.</p>',
    '</body></html>',
  ].join('\n');
}

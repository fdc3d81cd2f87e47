/** A message in the product's own look: plain text for every client, and the same in simple HTML. */
export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

export interface MailParts {
  subject: string;
  greeting: string;
  paragraphs: string[];
  action?: { label: string; url: string };
  footnote?: string;
}

/** Lays a message out; every piece of text is escaped, the action is a single button-like link. */
export function layoutMail(parts: MailParts): MailContent {
  const textBody = [
    parts.greeting,
    '',
    ...parts.paragraphs.flatMap((p) => [p, '']),
    ...(parts.action ? [`${parts.action.label}: ${parts.action.url}`, ''] : []),
    ...(parts.footnote ? [parts.footnote, ''] : []),
    '— Barwright',
  ].join('\n');
  const p = (s: string) => `<p style="margin:0 0 14px;line-height:1.5">${escapeHtml(s)}</p>`;
  const action = parts.action
    ? `<p style="margin:22px 0"><a href="${escapeHtml(parts.action.url)}" style="background:#a8782f;color:#ffffff;padding:10px 18px;border-radius:6px;text-decoration:none;font-weight:500">${escapeHtml(parts.action.label)}</a></p>` +
      `<p style="margin:0 0 14px;font-size:12px;color:#5b6470">Or paste this address into your browser: ${escapeHtml(parts.action.url)}</p>`
    : '';
  const html = `<!doctype html><html><body style="margin:0;background:#f4f5f6;font-family:Roboto,Arial,sans-serif;color:#1f252c">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0"><tr><td align="center" style="padding:24px 12px">
<table role="presentation" width="100%" style="max-width:560px;background:#ffffff;border:1px solid #d9dde2;border-radius:8px" cellpadding="0" cellspacing="0">
<tr><td style="padding:18px 24px;border-bottom:3px solid #4a5561;font-size:18px;font-weight:500;letter-spacing:.04em;color:#34404c">Barwright</td></tr>
<tr><td style="padding:24px">${p(parts.greeting)}${parts.paragraphs.map(p).join('')}${action}${parts.footnote ? `<p style="margin:18px 0 0;font-size:12px;color:#5b6470">${escapeHtml(parts.footnote)}</p>` : ''}</td></tr>
</table></td></tr></table></body></html>`;
  return { subject: parts.subject, text: textBody, html };
}

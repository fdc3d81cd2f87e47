import { layoutMail, type MailContent } from '../mail/mail-layout';

export interface MailLinks {
  /** Absolute URL that opens what the notification is about. */
  open: string;
  /** Absolute one-click unsubscribe URL. */
  unsubscribe: string;
}

const footnote = (unsubscribe: string, mode: string) =>
  `You get these e-mails because your Barwright notification e-mail is set to ${mode}. Change it in your notification settings, or turn these e-mails off with one click: ${unsubscribe}`;

export function notificationMail(name: string, text: string, links: MailLinks): MailContent {
  return layoutMail({
    subject: text.length > 90 ? `${text.slice(0, 87)}…` : text,
    greeting: `Hello ${name},`,
    paragraphs: [text],
    action: { label: 'Open in Barwright', url: links.open },
    footnote: footnote(links.unsubscribe, 'immediate'),
  });
}

export function digestMail(name: string, lines: string[], links: MailLinks): MailContent {
  return layoutMail({
    subject: `Barwright: ${lines.length} new notification${lines.length === 1 ? '' : 's'}`,
    greeting: `Hello ${name},`,
    paragraphs: ['Since your last digest:', ...lines.map((l) => `• ${l}`)],
    action: { label: 'Open your notifications', url: links.open },
    footnote: footnote(links.unsubscribe, 'daily digest'),
  });
}

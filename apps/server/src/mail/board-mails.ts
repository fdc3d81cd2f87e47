import { layoutMail, type MailContent } from './mail-layout';

export function invitationMail(inviter: string, boardName: string, role: string, url: string): MailContent {
  return layoutMail({
    subject: `${inviter} invited you to the board "${boardName}"`,
    greeting: 'Hello,',
    paragraphs: [
      `${inviter} invited you to work on the Barwright board "${boardName}" as ${role === 'editor' ? 'an editor (you can change its bar designs)' : 'a viewer (you can follow its bar designs live)'}.`,
      'Sign in, or create an account with this e-mail address, then accept with the link below.',
    ],
    action: { label: 'Accept the invitation', url },
    footnote: 'The link works once and expires in 7 days.',
  });
}

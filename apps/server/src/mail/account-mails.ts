import { layoutMail, type MailContent } from './mail-layout';

export function verificationMail(name: string, url: string): MailContent {
  return layoutMail({
    subject: 'Confirm your e-mail for Barwright',
    greeting: `Hello ${name},`,
    paragraphs: ['Welcome to Barwright. Confirm this address so your club can reach you about boards, remixes and comments.'],
    action: { label: 'Confirm my e-mail', url },
    footnote: 'The link works once and expires in 48 hours. If you did not sign up, ignore this message.',
  });
}

export function alreadyRegisteredMail(name: string, signInUrl: string, resetUrl: string): MailContent {
  return layoutMail({
    subject: 'Someone tried to sign up with your e-mail',
    greeting: `Hello ${name},`,
    paragraphs: [
      'Somebody, perhaps you, tried to create a Barwright account with this address, which already has one.',
      `To sign in, go to ${signInUrl}. If you have forgotten your password, reset it at ${resetUrl}.`,
    ],
    footnote: 'If this was not you, nothing has changed and you can ignore this message.',
  });
}

export function passwordResetMail(name: string, url: string): MailContent {
  return layoutMail({
    subject: 'Reset your Barwright password',
    greeting: `Hello ${name},`,
    paragraphs: ['Someone asked to reset the password of your Barwright account. Choose a new one with the link below.'],
    action: { label: 'Choose a new password', url },
    footnote: 'The link works once and expires in one hour. If you did not ask for it, ignore this message; your password stays as it is.',
  });
}

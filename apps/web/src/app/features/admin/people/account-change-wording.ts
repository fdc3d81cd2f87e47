import type { Role } from '@barwright/contracts';
import type { ReasonWording } from '../../../shared/reason-dialog/reason-dialog';

/** A change the People page asks an admin to confirm. */
export type AccountChange = { kind: 'role'; from: Role; to: Role } | { kind: 'suspend' } | { kind: 'restore' };

/** The confirm dialog's words; the reason goes into the audit log. */
export type AccountChangeWording = ReasonWording;

/** What each role may do, as a phrase after the person (the People page's list of roles and its dialogs say the same). */
export const ROLE_POWERS: Readonly<Record<Role, string>> = {
  member: 'designs bars on their boards, publishes, rates, comments and remixes.',
  moderator: 'also works the moderation desk: reports, hidden items, the showcase and the audit log.',
  admin: 'also manages people on this page: roles, admin included, and suspensions.',
};

const ROLE_NAMES: Readonly<Record<Role, string>> = { member: 'a member', moderator: 'a moderator', admin: 'an admin' };

/** "Maren is now a moderator." */
export const roleNowText = (name: string, role: Role) => `${name} is now ${ROLE_NAMES[role]}.`;

/** The words of the confirm dialog for one change of one account (pure). */
export function accountChangeWording(name: string, email: string, change: AccountChange): AccountChangeWording {
  switch (change.kind) {
    case 'role': {
      const gains = rank(change.to) > rank(change.from);
      const what = gains ? `As ${ROLE_NAMES[change.to]}, ${name} ${ROLE_POWERS[change.to]}` : `${name} loses what ${ROLE_NAMES[change.from]} may do at once.`;
      return {
        title: change.to === 'member' ? `Make ${name} a member again?` : `Make ${name} ${ROLE_NAMES[change.to]}?`,
        message: `${what} The change applies at once; you can undo it right after.`,
        label: 'Reason, for the audit log',
        required: true,
        confirm: change.to === 'member' ? 'Make member' : `Make ${change.to}`,
        danger: change.to === 'admin',
      };
    }
    case 'suspend':
      return {
        title: `Suspend ${name}?`,
        message: `${email} is signed out everywhere at once and cannot sign in until an admin restores the account. Their designs stay as they are.`,
        label: 'Reason, for the audit log',
        required: true,
        confirm: 'Suspend account',
        danger: true,
      };
    case 'restore':
      return {
        title: `Restore ${name}?`,
        message: `${email} can sign in again with their password.`,
        label: 'Note for the audit log (optional)',
        required: false,
        confirm: 'Restore account',
        danger: false,
      };
  }
}

const rank = (role: Role) => ({ member: 0, moderator: 1, admin: 2 })[role];

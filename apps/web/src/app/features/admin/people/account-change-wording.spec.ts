import { describe, expect, it } from 'vitest';
import { accountChangeWording, ROLE_POWERS, roleNowText } from './account-change-wording';

describe('the words of an account change', () => {
  it('ask for a reason for every role change, and mark making an admin as weighty', () => {
    const admin = accountChangeWording('Maren', 'maren@example.test', { kind: 'role', from: 'member', to: 'admin' });
    expect(admin).toMatchObject({ title: 'Make Maren an admin?', confirm: 'Make admin', required: true, danger: true });
    expect(admin.message).toBe(`As an admin, Maren ${ROLE_POWERS.admin} The change applies at once; you can undo it right after.`);
    const back = accountChangeWording('Tobias', 'tobias@example.test', { kind: 'role', from: 'moderator', to: 'member' });
    expect(back).toMatchObject({ title: 'Make Tobias a member again?', confirm: 'Make member', required: true, danger: false });
    expect(back.message).toMatch(/^Tobias loses what a moderator may do at once\. The change applies at once; you can undo it right after\.$/);
  });

  it('require a reason to suspend, and take an optional note to restore', () => {
    expect(accountChangeWording('Ilse', 'ilse@example.test', { kind: 'suspend' })).toMatchObject({ required: true, danger: true, confirm: 'Suspend account' });
    expect(accountChangeWording('Ilse', 'ilse@example.test', { kind: 'restore' })).toMatchObject({ required: false, danger: false });
  });

  it('say the new role with its article', () => {
    expect(roleNowText('Maren', 'admin')).toBe('Maren is now an admin.');
    expect(roleNowText('Maren', 'moderator')).toBe('Maren is now a moderator.');
  });
});

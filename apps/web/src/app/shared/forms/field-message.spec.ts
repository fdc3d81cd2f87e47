import { describe, expect, it } from 'vitest';
import { fieldMessage } from './field-message';

describe('fieldMessage', () => {
  it('says nothing for a valid field', () => {
    expect(fieldMessage('E-mail', null)).toBe('');
  });

  it('puts the label before a server or contract fragment', () => {
    expect(fieldMessage('Password', { server: 'is too common' })).toBe('Password is too common');
    expect(fieldMessage('Password', { contract: 'must be at least 12 characters' })).toBe('Password must be at least 12 characters');
  });

  it('leaves a message that is already a sentence alone', () => {
    expect(fieldMessage('Password', { server: 'Pick a longer phrase.' })).toBe('Pick a longer phrase.');
  });

  it('prefers the server message, then "required", over the rest', () => {
    expect(fieldMessage('E-mail', { required: true, server: 'is taken' })).toBe('E-mail is taken');
    expect(fieldMessage('E-mail', { required: true, contract: 'must be an e-mail address' })).toBe('E-mail is required');
  });

  it('states the length limits of Angular validators', () => {
    expect(fieldMessage('Name', { maxlength: { requiredLength: 60, actualLength: 61 } })).toBe('Name must be at most 60 characters');
  });
});

import { FormControl } from '@angular/forms';
import { emailSchema, passwordSchema } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { contractValidator } from './contract-validator';

describe('contractValidator', () => {
  it('passes what the contract accepts', () => {
    expect(new FormControl('Ada@Example.test', contractValidator(emailSchema)).errors).toBeNull();
  });

  it("reports the contract's own message, so web and server say the same", () => {
    expect(new FormControl('short', contractValidator(passwordSchema)).errors).toEqual({ contract: 'must be at least 12 characters' });
    expect(new FormControl('not-an-address', contractValidator(emailSchema)).errors).toEqual({ contract: 'must be an e-mail address' });
  });
});

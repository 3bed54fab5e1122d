import { describe, expect, it } from 'vitest';
import { checkEmail, checkNewPassword, checkRepeat, checkText, collectErrors } from './validation';

describe('form checks', () => {
  it('ask for an e-mail address that looks like one', () => {
    expect(checkEmail('')).toMatch(/Enter an e-mail/);
    expect(checkEmail('robin')).toMatch(/such as/);
    expect(checkEmail('robin vale@x')).toMatch(/such as/);
    expect(checkEmail(' robin@studio.localhost ')).toBeNull();
  });

  it('want new passwords of 12 to 256 characters, the API’s limits', () => {
    expect(checkNewPassword('a'.repeat(11))).toMatch(/at least 12/);
    expect(checkNewPassword('a'.repeat(12))).toBeNull();
    expect(checkNewPassword('a'.repeat(257))).toMatch(/at most 256/);
  });

  it('compare the repeated password and bound texts', () => {
    expect(checkRepeat('one long password', 'one long passw0rd')).toMatch(/differ/);
    expect(checkText('   ', 'a name', 5)).toBe('Enter a name.');
    expect(checkText('abcdef', 'a name', 5)).toMatch(/at most 5/);
  });

  it('collect only the fields with a problem', () => {
    expect(collectErrors({ a: null, b: 'bad' })).toEqual({ b: 'bad' });
  });
});

import { describe, expect, it } from 'vitest';
import { passwordSchema } from './password';
import { signUpSchema } from './sign-up';

// Common practice (long passphrases over composition rules); 72 bytes is bcrypt's input limit.
const CASES: ReadonlyArray<{ password: string; ok: boolean; why: string }> = [
  { password: 'lathe bed ways', ok: true, why: 'a short phrase of 14 characters' },
  { password: 'abcdefghijkl', ok: true, why: 'exactly 12 characters, no symbols' },
  { password: 'abcdefghijk', ok: false, why: '11 characters' },
  { password: 'aaaaaaaaaaaaaaaa', ok: false, why: 'one character repeated' },
  { password: 'abababababab', ok: false, why: 'two characters repeated' },
  { password: 'xyz' + 'x'.repeat(69), ok: true, why: 'exactly 72 bytes' },
  { password: 'xyz' + 'x'.repeat(70), ok: false, why: '73 bytes' },
  { password: 'drehbank-öl-wechsel-'.padEnd(70, 'ü'), ok: false, why: '70 characters but more than 72 bytes' },
];

describe('the password rule', () => {
  it.each(CASES)('judges $why as ok=$ok', ({ password, ok }) => {
    expect(passwordSchema.safeParse(password).success).toBe(ok);
  });

  it('asks for the second password to match on sign-up', () => {
    const result = signUpSchema.safeParse({
      role: 'seller',
      name: 'Ines Harrow',
      businessName: 'Harrow Spindle Works',
      town: 'Lowmere',
      region: 'Brenmark',
      email: ' Ines@Harrow-Spindle.example ',
      password: 'a long lathe phrase',
      passwordAgain: 'a long lathe phrasE',
    });
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((issue) => issue.path.join('.'))).toEqual(['passwordAgain']);
  });

  it('normalises the e-mail address on sign-up', () => {
    const result = signUpSchema.parse({
      role: 'buyer',
      name: 'Ines Harrow',
      businessName: 'Harrow Spindle Works',
      town: 'Lowmere',
      region: 'Brenmark',
      email: ' Ines@Harrow-Spindle.example ',
      password: 'a long lathe phrase',
      passwordAgain: 'a long lathe phrase',
    });
    expect(result.email).toBe('ines@harrow-spindle.example');
  });
});

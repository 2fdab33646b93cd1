import { describe, expect, it } from 'vitest';
import { passwordSchema, setPasswordSchema } from './auth';

// Length 12 and "not only spaces" are common practice for a password people type, not a standard's figure.
describe('password rule', () => {
  it('accepts 12 characters, spaces inside included', () => {
    expect(passwordSchema.safeParse('twelve chars').success).toBe(true);
    expect(passwordSchema.safeParse('  padded pass  ').success).toBe(true);
  });

  it('refuses 11 characters, twelve spaces and other blank-only text', () => {
    for (const p of ['elevenchars', ' '.repeat(12), ' '.repeat(10), '\t \n'.repeat(5)])
      expect(passwordSchema.safeParse(p).success).toBe(false);
  });

  it('is the rule the set-password form and the server both read', () => {
    const result = setPasswordSchema.safeParse({ token: 't'.repeat(30), password: ' '.repeat(12) });
    expect(result.success).toBe(false);
    expect(result.error!.issues.map((i) => i.path.join('.'))).toEqual(['password']);
  });
});

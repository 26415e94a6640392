import { describe, expect, it } from 'vitest';
import { PASSWORD_MIN_LENGTH, PASSWORD_RULE, passwordResetSchema, signUpSchema } from '@/shared/schemas/auth';

describe('the password rule shown at the field', () => {
  it('states the length the schema enforces', () => {
    expect(PASSWORD_RULE).toContain(`At least ${PASSWORD_MIN_LENGTH} characters`);
    expect(passwordResetSchema.safeParse({ password: 'x'.repeat(PASSWORD_MIN_LENGTH) }).success).toBe(true);
    const short = passwordResetSchema.safeParse({ password: 'x'.repeat(PASSWORD_MIN_LENGTH - 1) });
    expect(short.error?.issues[0]).toMatchObject({ path: ['password'] });
  });

  it('names the e-mail address, which sign-up refuses at the password field', () => {
    expect(PASSWORD_RULE).toMatch(/not your e-mail address/);
    const body = {
      name: 'A',
      email: 'pat.smith@example.test',
      firmName: 'F',
      password: 'pat.smith@example.test',
    };
    expect(signUpSchema.safeParse(body).error?.issues[0].path).toEqual(['password']);
  });
});

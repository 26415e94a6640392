import { AppError } from '@/server/app-error';
import { PASSWORD_IS_EMAIL, passwordMatchesEmail } from '@/shared/schemas/auth';
import { PASSWORD_IS_COMMON, isCommonPassword } from './common-password';

/**
 * What is wrong with a new password beyond its length (which the shared schema checks): the person's own
 * e-mail address, or one of the most common passwords. Undefined when it may be used.
 */
export function passwordRuleProblem(
  password: string,
  person: { email: string; name?: string },
): string | undefined {
  if (passwordMatchesEmail(password, person.email)) return PASSWORD_IS_EMAIL;
  const local = person.email.split('@')[0];
  const names = person.name ? [person.name, person.name.replace(/\s+/g, '')] : [];
  const personal = [person.email, local, local.replace(/[^\p{L}\p{N}]+/gu, ''), ...names];
  if (isCommonPassword(password, personal)) return PASSWORD_IS_COMMON;
  return undefined;
}

/** Throws a 400 naming the password field when {@link passwordRuleProblem} finds something. */
export function refusePassword(password: string, person: { email: string; name?: string }): void {
  const problem = passwordRuleProblem(password, person);
  if (problem) throw new AppError('bad_request', 'Some fields need attention', { password: [problem] });
}

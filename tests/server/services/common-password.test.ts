import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { dictionary } from '@zxcvbn-ts/language-common';
import { describe, expect, it } from 'vitest';
import { PASSWORD_IS_COMMON, isCommonPassword } from '@/server/services/common-password';
import { passwordRuleProblem } from '@/server/services/password-rules';
import { PASSWORD_IS_EMAIL } from '@/shared/schemas/auth';

// Source of "common": the `passwords-common` list of @zxcvbn-ts/language-common 4.1.3 (breach-corpus
// passwords, most common first), read through @zxcvbn-ts/core 4.2's matching and scoring.
const commonList = dictionary['passwords-common'];

describe('isCommonPassword', () => {
  it('refuses entries of the package list that pass the length rule, as listed', () => {
    for (const password of ['1234567890', 'qwertyuiop', 'password123', 'basketball', '1qaz2wsx3edc']) {
      expect(commonList, `${password} is in the package list`).toContain(password);
      expect(isCommonPassword(password), password).toBe(true);
    }
  });

  it('refuses case changes, l33t spellings, reversals and additions of a listed password', () => {
    expect(commonList).toContain('password');
    for (const password of ['PASSWORD1234', 'P@ssw0rd1234', 'drowssap123', 'Password2024']) {
      expect(isCommonPassword(password), password).toBe(true);
    }
  });

  it('refuses repeats, sequences and keyboard walks that are long enough for the length rule', () => {
    for (const password of ['aaaaaaaaaaaa', 'abcdefghijkl', '1q2w3e4r5t6y', 'zxcvbnm,./']) {
      expect(isCommonPassword(password), password).toBe(true);
    }
  });

  it('refuses the person’s own name with a year, given as a personal word', () => {
    expect(isCommonPassword('janedoe2024')).toBe(false);
    expect(isCommonPassword('janedoe2024', ['janedoe'])).toBe(true);
  });

  it('lets a few unrelated words or a random string through', () => {
    for (const password of [
      'correct horse battery',
      'a long enough passphrase',
      'tributary-demo',
      'k7#Vq9!mWz2p',
    ]) {
      expect(isCommonPassword(password), password).toBe(false);
    }
  });

  it('judges a very long password by its first 64 characters, so no check holds the server long', () => {
    const start = performance.now();
    expect(isCommonPassword('P@ssw0rd'.repeat(25))).toBe(true);
    expect(isCommonPassword(`${'unrelated words '.repeat(4)}${'P@ssw0rd'.repeat(16)}`)).toBe(false);
    // Without the package's limits (4 l33t substitutions, 64 characters) this took over 400 ms.
    expect(performance.now() - start).toBeLessThan(1000);
  });
});

describe('passwordRuleProblem', () => {
  it('names the e-mail address first, then a common password built from the person’s own name', () => {
    const person = { email: 'jane.doe@example.test', name: 'Jane Doe' };
    expect(passwordRuleProblem('JANE.DOE@example.test', person)).toBe(PASSWORD_IS_EMAIL);
    expect(passwordRuleProblem('janedoe2024', person)).toBe(PASSWORD_IS_COMMON);
    expect(passwordRuleProblem('JaneDoe1990', person)).toBe(PASSWORD_IS_COMMON);
    expect(passwordRuleProblem('janedoe2024', { email: 'pat@example.test', name: 'Pat' })).toBeUndefined();
  });
});

describe('placement', () => {
  it('stays out of the client: nothing under app/, lib/ or shared/ imports the check or its dictionary', () => {
    const clientFiles = ['app', 'lib', 'shared'].flatMap((dir) =>
      readdirSync(dir, { recursive: true, encoding: 'utf8' })
        .filter((file) => /\.tsx?$/.test(file))
        .map((file) => join(dir, file)),
    );
    expect(clientFiles.length).toBeGreaterThan(50);
    const importers = clientFiles.filter((file) =>
      /@zxcvbn-ts|services\/common-password|services\/password-rules/.test(readFileSync(file, 'utf8')),
    );
    expect(importers).toEqual([]);
  });
});

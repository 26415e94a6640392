import { describe, expect, it } from 'vitest';
import { isFirmScopedKey, keys } from '@/lib/api/keys';

describe('SWR keys', () => {
  it('scopes firm data by firm id', () => {
    expect(keys.jobs('a')).not.toEqual(keys.jobs('b'));
    expect(keys.job('a', 'j1')).toEqual(['job', 'a', 'j1']);
  });

  it('tells firm data from public data', () => {
    expect(isFirmScopedKey(keys.me(null))).toBe(true);
    expect(isFirmScopedKey(keys.members('a'))).toBe(true);
    expect(isFirmScopedKey(keys.invitation('t'))).toBe(false);
    expect(isFirmScopedKey(keys.devMail())).toBe(false);
    expect(isFirmScopedKey('me')).toBe(false);
  });
});

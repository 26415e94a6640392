import { describe, expect, it } from 'vitest';
import { isFirmScopedKey, keys } from '@/lib/api/keys';

describe('SWR keys', () => {
  it('scopes firm data by firm id', () => {
    expect(keys.jobs('a')).not.toEqual(keys.jobs('b'));
    expect(keys.job('a', 'j1')).toEqual(['job', 'a', 'j1']);
    expect(keys.jobMembers('a', 'j1')).not.toEqual(keys.jobMembers('b', 'j1'));
    expect(keys.member('a', 'm1')).toEqual(['member', 'a', 'm1']);
  });

  it("keeps a job's structural members apart from the firm's people", () => {
    expect(keys.jobMembers('a', 'j1')[0]).not.toBe(keys.members('a')[0]);
    expect(keys.member('a', 'm1')[0]).not.toBe(keys.members('a')[0]);
  });

  it('tells firm data from public data', () => {
    expect(isFirmScopedKey(keys.me(null))).toBe(true);
    expect(isFirmScopedKey(keys.members('a'))).toBe(true);
    expect(isFirmScopedKey(keys.jobMembers('a', 'j1'))).toBe(true);
    expect(isFirmScopedKey(keys.member('a', 'm1'))).toBe(true);
    expect(isFirmScopedKey(keys.sessions()), 'sessions go with the session').toBe(true);
    for (const key of [
      keys.jobScreens('a', 'j1'),
      keys.screen('a', 's1'),
      keys.checklist('a', 'j1'),
      keys.jobProgress('a'),
      keys.shoring('a', 'm1'),
    ])
      expect(isFirmScopedKey(key)).toBe(true);
    expect(isFirmScopedKey(keys.invitation('t'))).toBe(false);
    expect(isFirmScopedKey(keys.devMail())).toBe(false);
    expect(isFirmScopedKey('me')).toBe(false);
  });
});

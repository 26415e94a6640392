import { describe, expect, it } from 'vitest';
import { nextVersion, versionOf, withBaseVersion } from '@/lib/offline/queue-write';

// docs/sync-protocol.md §3: an edit carries the version it was read at; without one, last writer wins.
describe('versions on queued edits', () => {
  it('an edit of a record with a version carries it as baseVersion', () => {
    expect(withBaseVersion({ name: 'Kitchen' }, { id: 'j1', version: 4 })).toEqual({
      name: 'Kitchen',
      baseVersion: 4,
    });
  });

  it('a record without a version (a server before versions) gets no baseVersion', () => {
    expect(withBaseVersion({ name: 'Kitchen' }, { id: 'j1' })).toEqual({ name: 'Kitchen' });
    expect(versionOf(undefined)).toBeUndefined();
  });

  it('the device copy after a queued edit is one version on, so a second offline edit bases on the first', () => {
    const first = nextVersion({ id: 'j1', version: 4 });
    expect(first.version).toBe(5);
    expect(withBaseVersion({ name: 'again' }, first)).toEqual({ name: 'again', baseVersion: 5 });
    expect(nextVersion({ id: 'j1' })).toEqual({ id: 'j1' });
  });
});

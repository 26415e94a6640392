import { describe, expect, it } from 'vitest';
import { splitLinks } from '@/lib/ui/split-links';

describe('splitLinks', () => {
  it('finds links inside text and leaves trailing punctuation outside', () => {
    expect(splitLinks('Open http://127.0.0.1:8099/invite/abc. Thanks')).toEqual([
      { kind: 'text', value: 'Open ' },
      { kind: 'link', value: 'http://127.0.0.1:8099/invite/abc' },
      { kind: 'text', value: '. Thanks' },
    ]);
  });

  it('returns plain text untouched', () => {
    expect(splitLinks('No links here')).toEqual([{ kind: 'text', value: 'No links here' }]);
    expect(splitLinks('')).toEqual([]);
  });
});

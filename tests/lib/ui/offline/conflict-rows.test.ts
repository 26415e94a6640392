import { describe, expect, it } from 'vitest';
import { conflictRows, fieldLabel } from '@/lib/ui/offline/conflict-rows';

describe('conflictRows', () => {
  it('lists only the fields the edit sets that differ from the server, leaf by leaf', () => {
    const mine = { name: 'Kitchen', notes: 'same', baseVersion: 2, input: { spanFt: 12, kind: 'beam' } };
    const server = {
      id: 'j1',
      name: 'Kitchen wall',
      notes: 'same',
      version: 3,
      input: { spanFt: 14, kind: 'beam' },
    };
    expect(conflictRows(mine, server)).toEqual([
      { path: 'name', mine: 'Kitchen', server: 'Kitchen wall' },
      { path: 'input.spanFt', mine: '12', server: '14' },
    ]);
  });

  it('shows a field the server does not have as a dash, and lists of another length whole', () => {
    const rows = conflictRows({ note: 'new', sources: [1, 2] }, { sources: [1] });
    expect(rows).toEqual([
      { path: 'note', mine: 'new', server: '—' },
      { path: 'sources', mine: '[1,2]', server: '[1]' },
    ]);
  });

  it('finds nothing to show when the server already has the same values', () => {
    expect(conflictRows({ state: 'done', baseVersion: 4 }, { state: 'done', version: 5 })).toEqual([]);
  });
});

describe('fieldLabel', () => {
  it('turns a field path into words', () => {
    expect(fieldLabel('input.clearSpanIn')).toBe('Input › clear span in');
  });
});

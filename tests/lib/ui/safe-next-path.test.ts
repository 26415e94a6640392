import { describe, expect, it } from 'vitest';
import { safeNextPath } from '@/lib/ui/safe-next-path';

describe('safeNextPath', () => {
  it('keeps in-app paths', () => {
    expect(safeNextPath('/invite/abc')).toBe('/invite/abc');
    expect(safeNextPath(['/jobs', '/x'])).toBe('/jobs');
  });

  it('refuses anything that could leave the site', () => {
    expect(safeNextPath('https://elsewhere.test')).toBeNull();
    expect(safeNextPath('//elsewhere.test')).toBeNull();
    expect(safeNextPath('/\\elsewhere.test')).toBeNull();
    expect(safeNextPath('javascript:alert(1)')).toBeNull();
    expect(safeNextPath('/jobs\n')).toBeNull();
    expect(safeNextPath(undefined)).toBeNull();
  });
});

import { describe, expect, it } from 'vitest';
import { homePathForRole, isNavItemActive, navItemsForRole } from '@/lib/ui/nav-items';

const labels = (role: Parameters<typeof navItemsForRole>[0]) => navItemsForRole(role).map((i) => i.label);

describe('navigation by role', () => {
  it('gives each role its tabs', () => {
    expect(labels('owner')).toEqual(['Jobs', 'Span tables', 'Members', 'Price book', 'Account']);
    expect(labels('contractor')).toEqual(['Jobs', 'Span tables', 'Price book', 'Account']);
    expect(labels('estimator')).toEqual(['Jobs', 'Span tables', 'Price book', 'Account']);
    expect(labels('engineer')).toEqual(['Requests', 'Account']);
  });

  it('lands engineers on Requests and everyone else on Jobs', () => {
    expect(homePathForRole('engineer')).toBe('/requests');
    expect(homePathForRole('owner')).toBe('/jobs');
  });

  it('marks a tab active on its page and the pages below it only', () => {
    const [jobs] = navItemsForRole('owner');
    expect(isNavItemActive(jobs, '/jobs')).toBe(true);
    expect(isNavItemActive(jobs, '/jobs/abc')).toBe(true);
    expect(isNavItemActive(jobs, '/jobsite')).toBe(false);
    const spanTables = navItemsForRole('contractor')[1];
    expect(spanTables.href).toBe('/span-tables');
    expect(isNavItemActive(spanTables, '/span-tables')).toBe(true);
    expect(isNavItemActive(jobs, '/span-tables')).toBe(false);
  });
});

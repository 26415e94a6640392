import type { Role } from '@/shared/schemas/auth';
import type { IconName } from './icon';

export type NavItem = {
  href: '/jobs' | '/span-tables' | '/members' | '/requests' | '/account' | '/price-book';
  label: string;
  icon: IconName;
};

const jobs: NavItem = { href: '/jobs', label: 'Jobs', icon: 'jobs' };
const spanTables: NavItem = { href: '/span-tables', label: 'Span tables', icon: 'spanTable' };
const members: NavItem = { href: '/members', label: 'Members', icon: 'members' };
const requests: NavItem = { href: '/requests', label: 'Requests', icon: 'requests' };
const priceBook: NavItem = { href: '/price-book', label: 'Price book', icon: 'priceBook' };
const account: NavItem = { href: '/account', label: 'Account', icon: 'account' };

const byRole: Record<Role, NavItem[]> = {
  owner: [jobs, spanTables, members, priceBook, account],
  contractor: [jobs, spanTables, priceBook, account],
  estimator: [jobs, spanTables, priceBook, account],
  engineer: [requests, account],
};

/** The navigation a role sees, in order. */
export function navItemsForRole(role: Role): NavItem[] {
  return byRole[role];
}

/** Where a role lands after signing in. */
export function homePathForRole(role: Role): NavItem['href'] {
  return byRole[role][0].href;
}

/** True when `pathname` is the item's page or one below it. */
export function isNavItemActive(item: NavItem, pathname: string): boolean {
  return pathname === item.href || pathname.startsWith(`${item.href}/`);
}

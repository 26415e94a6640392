import type { Role } from '@/shared/schemas/auth';
import type { IconName } from './icon';

export type NavItem = {
  href: '/jobs' | '/members' | '/requests' | '/account';
  label: string;
  icon: IconName;
};

const jobs: NavItem = { href: '/jobs', label: 'Jobs', icon: 'jobs' };
const members: NavItem = { href: '/members', label: 'Members', icon: 'members' };
const requests: NavItem = { href: '/requests', label: 'Requests', icon: 'requests' };
const account: NavItem = { href: '/account', label: 'Account', icon: 'account' };

const byRole: Record<Role, NavItem[]> = {
  owner: [jobs, members, account],
  contractor: [jobs, account],
  estimator: [jobs, account],
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

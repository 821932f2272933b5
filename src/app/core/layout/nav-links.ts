import type { UserRole } from '@shared/contracts/auth';
import type { IconName } from '../icon-names';

export interface NavLink {
  path: string;
  label: string;
  icon: IconName;
}

/** Navigation for each role; everyone can browse hay. */
export function navLinksFor(role: UserRole | null): NavLink[] {
  const links: NavLink[] = [{ path: '/hay', label: 'Find hay', icon: 'search' }];
  // Planning needs no account, so visitors see the planner too; the hay list is for buyers and visitors.
  if (role === 'buyer' || role === null) links.push({ path: '/planner', label: 'Herd planner', icon: 'calculate' });
  if (role === 'buyer' || role === null) links.push({ path: '/cart', label: 'Hay list', icon: 'inventory_2' });
  if (role === 'buyer' || role === 'grower') links.push({ path: '/orders', label: role === 'buyer' ? 'My orders' : 'Orders', icon: 'agriculture' });
  if (role === 'grower') links.push({ path: '/selling', label: 'My lots', icon: 'inventory_2' });
  if (role === 'buyer' || role === 'grower') links.push({ path: '/messages', label: 'Messages', icon: 'info' });
  if (role === 'admin') links.push({ path: '/admin', label: 'Review desk', icon: 'fact_check' });
  return links;
}

/** Where each role lands after signing in: buyers on their orders, growers on their lots, admins on the review desk. */
export function homeFor(role: UserRole): string {
  return role === 'buyer' ? '/orders' : role === 'grower' ? '/selling' : '/admin';
}

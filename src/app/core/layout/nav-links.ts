import type { UserRole } from '../../../../shared/contracts/auth';

export interface NavLink {
  path: string;
  label: string;
  icon: string;
}

/** Navigation for each role; everyone can browse hay. */
export function navLinksFor(role: UserRole | null): NavLink[] {
  const links: NavLink[] = [{ path: '/hay', label: 'Find hay', icon: 'search' }];
  if (role === 'buyer') links.push({ path: '/planner', label: 'Herd planner', icon: 'calculate' });
  if (role === 'grower') links.push({ path: '/selling', label: 'My lots', icon: 'inventory_2' });
  if (role === 'admin') links.push({ path: '/admin', label: 'Review desk', icon: 'fact_check' });
  return links;
}

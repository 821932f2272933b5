import type { UserRole } from '@shared/contracts/auth';

export interface NavLink {
  path: string;
  label: string;
  icon: string;
}

/** Navigation for each role; everyone can browse hay. */
export function navLinksFor(role: UserRole | null): NavLink[] {
  const links: NavLink[] = [{ path: '/hay', label: 'Find hay', icon: 'search' }];
  // Planning needs no account, so visitors see the planner too; the cart is for buyers and visitors.
  if (role === 'buyer' || role === null) links.push({ path: '/planner', label: 'Herd planner', icon: 'calculate' });
  if (role === 'buyer' || role === null) links.push({ path: '/cart', label: 'Cart', icon: 'shopping_cart' });
  if (role === 'grower') links.push({ path: '/selling', label: 'My lots', icon: 'inventory_2' });
  if (role === 'admin') links.push({ path: '/admin', label: 'Review desk', icon: 'fact_check' });
  return links;
}

/** The main navigation, filtered by what the role may do (the server still checks every page). */
import { roleAllows, type Permission, type RoleName } from './permissions';

export interface NavItem {
  href: string;
  label: string;
}

const items: (NavItem & { needs: Permission })[] = [
  { href: '/portfolio', label: 'Portfolio', needs: { project: ['read'] } },
  { href: '/projects', label: 'Projects', needs: { project: ['read'] } },
  { href: '/compare', label: 'Compare', needs: { case: ['read'] } },
  { href: '/review', label: 'Review', needs: { review: ['read'] } },
  { href: '/alerts', label: 'Alerts', needs: { case: ['read'] } },
  { href: '/settings', label: 'Settings', needs: { settings: ['update'] } },
];

export function navigationFor(role: RoleName): NavItem[] {
  return items.filter((item) => roleAllows(role, item.needs)).map(({ href, label }) => ({ href, label }));
}

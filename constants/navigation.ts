// What each role sees in the navigation. The server's role checks are the authority; this only hides
// screens a role may not use. A feature adds its entry here.
import type { Role } from '@/hooks/use-session';

export type NavItem = { href: string; label: string; glyph: string; roles: Role[]; testID: string };

// Order matters: on a phone the bottom bar shows each role's first four, the rest sit under More.
export const NAV_ITEMS: NavItem[] = [
  { href: '/', label: 'Home', glyph: '⌂', roles: ['admin', 'lead', 'technician', 'user'], testID: 'nav-home' },
  { href: '/review', label: 'Review', glyph: '✓', roles: ['lead'], testID: 'nav-review' },
  { href: '/my-station', label: 'My PC', glyph: '▣', roles: ['user'], testID: 'nav-my-station' },
  { href: '/sites', label: 'Sites', glyph: '▦', roles: ['admin', 'lead', 'technician'], testID: 'nav-sites' },
  { href: '/plans', label: 'Plans', glyph: '▤', roles: ['technician', 'admin'], testID: 'nav-plans' },
  { href: '/bundles', label: 'Bundles', glyph: '⇩', roles: ['admin'], testID: 'nav-bundles' },
  { href: '/survey', label: 'Survey', glyph: '☏', roles: ['admin', 'lead', 'technician'], testID: 'nav-survey' },
  { href: '/kits', label: 'Kits', glyph: '◆', roles: ['admin', 'technician'], testID: 'nav-kits' },
  { href: '/people', label: 'People', glyph: '☺', roles: ['admin'], testID: 'nav-people' },
  { href: '/audit', label: 'Audit', glyph: '☰', roles: ['admin'], testID: 'nav-audit' },
  { href: '/mail', label: 'Mail', glyph: '✉', roles: ['admin'], testID: 'nav-mail' },
];

export function navFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((i) => i.roles.includes(role));
}

/** True when `pathname` belongs to nav item `href` (Home only matches "/"). */
export function isActive(href: string, pathname: string): boolean {
  return href === '/' ? pathname === '/' : pathname === href || pathname.startsWith(`${href}/`);
}

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  lead: 'Lead',
  technician: 'Technician',
  user: 'Office user',
};

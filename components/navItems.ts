import type { Role } from '../shared/user';
import type { NavItem } from './AppShell';

interface GatedItem extends NavItem {
  roles?: readonly Role[];
}

export const CURATOR_ROLES = ['curator', 'admin'] as const;
export const ADMIN_ROLES = ['admin'] as const;

const ALL: GatedItem[] = [
  { href: '/analyse', label: 'Analyse', glyph: '◇', phone: true },
  { href: '/library', label: 'Library', glyph: '▦', phone: true },
  { href: '/history', label: 'History', glyph: '↺', phone: true },
  { href: '/batch', label: 'Batch', glyph: '▤' },
  { href: '/submit', label: 'Submit', glyph: '+', phone: true },
  { href: '/sync', label: 'Sync', glyph: '⇅' },
  { href: '/review', label: 'Review', glyph: '✓', roles: CURATOR_ROLES },
  { href: '/admin', label: 'Admin', glyph: '⚙', roles: ADMIN_ROLES },
  { href: '/account', label: 'Account', glyph: '◉' },
];

/** The navigation a role sees (items it may not open are hidden, and their routes are guarded). */
export function navItemsFor(role: Role): NavItem[] {
  return ALL.filter((i) => !i.roles || i.roles.includes(role)).map(({ roles: _roles, ...rest }) => rest);
}

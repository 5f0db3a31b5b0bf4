// Where each desk goes from the navigation. The first destination is the person's home: the desk
// for those who hold one, the trail for the auditor, people and projects for the administrator.
import type { Role } from '../../shared/roles';
import type { IconName } from '../ui/icons';

export type Destination = { key: string; href: string; label: string; icon: IconName; roles: readonly Role[] };

const deskHolders = ['contractor', 'section_engineer', 'central_office', 'engineer_of_record', 'field_inspector'] as const satisfies readonly Role[];

export const destinations: readonly Destination[] = [
  { key: 'desk', href: '/', label: 'My desk', icon: 'desk', roles: deskHolders },
  { key: 'new', href: '/requests/new', label: 'New request', icon: 'newRequest', roles: ['contractor'] },
  { key: 'conditions', href: '/conditions', label: 'Conditions', icon: 'conditions', roles: ['field_inspector', 'section_engineer'] },
  { key: 'trail', href: '/trail', label: 'Trail', icon: 'trail', roles: ['auditor'] },
  { key: 'people', href: '/people', label: 'People', icon: 'people', roles: ['admin'] },
  { key: 'register', href: '/register', label: 'Register', icon: 'register', roles: [...deskHolders, 'auditor', 'admin'] },
];

export function destinationsFor(role: Role): Destination[] {
  return destinations.filter((d) => d.roles.includes(role));
}

export function homeOf(role: Role): string {
  return destinationsFor(role)[0]?.href ?? '/register';
}

// The destination a path belongs to: the longest matching href, so /requests/new is not the desk.
export function activeDestination(pathname: string, role: Role): string | null {
  const candidates = destinationsFor(role).filter((d) => (d.href === '/' ? pathname === '/' : pathname === d.href || pathname.startsWith(`${d.href}/`)));
  return candidates.sort((a, b) => b.href.length - a.href.length)[0]?.key ?? null;
}

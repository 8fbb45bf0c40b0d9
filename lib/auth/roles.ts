// Roles and the sections each may open. Pure data shared by the nav, the proxy-free checks and tests.
export const ROLES = ['driver', 'jockey', 'clerk', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export type Section = 'gate' | 'yard' | 'desk' | 'trailers' | 'admin';

export const SECTION_ROLES: Record<Section, readonly Role[]> = {
  gate: ['driver', 'clerk', 'admin'],
  yard: ['jockey', 'clerk', 'admin'],
  desk: ['driver', 'clerk', 'admin'], // drivers see only their own carrier's cases
  trailers: ['jockey', 'clerk', 'admin'],
  admin: ['admin'],
};

export const SECTION_LABELS: Record<Section, string> = {
  gate: 'Gate',
  yard: 'Yard',
  desk: 'Desk',
  trailers: 'Trailers',
  admin: 'Admin',
};

export function canOpen(role: Role, section: Section): boolean {
  return SECTION_ROLES[section].includes(role);
}

/** Where a role lands after signing in. */
export function homeFor(role: Role): string {
  return { driver: '/gate', jockey: '/yard', clerk: '/desk', admin: '/desk' }[role];
}
